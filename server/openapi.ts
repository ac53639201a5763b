import type * as yup from 'yup';
import type { RouteDef } from './http/route';

type JsonSchema = Record<string, unknown>;

/** Enough of a yup description to document a request body as JSON Schema. */
function toJsonSchema(d: yup.SchemaDescription | yup.SchemaFieldDescription): JsonSchema {
  const desc = d as yup.SchemaDescription & { fields?: Record<string, yup.SchemaFieldDescription>; innerType?: yup.SchemaFieldDescription };
  const schema: JsonSchema = {};
  switch (desc.type) {
    case 'object':
      schema.type = 'object';
      schema.additionalProperties = false;
      schema.properties = Object.fromEntries(Object.entries(desc.fields ?? {}).map(([k, v]) => [k, toJsonSchema(v)]));
      schema.required = Object.entries(desc.fields ?? {})
        .filter(([, v]) => !(v as yup.SchemaDescription).optional)
        .map(([k]) => k);
      break;
    case 'array':
      schema.type = 'array';
      if (desc.innerType) schema.items = toJsonSchema(desc.innerType);
      break;
    case 'string':
    case 'number':
    case 'boolean':
      schema.type = desc.type;
      break;
    default:
      break;
  }
  if (desc.oneOf?.length) schema.enum = desc.oneOf.filter((v) => v !== undefined);
  for (const t of desc.tests ?? []) {
    const limit = (t.params as { min?: number; max?: number } | undefined) ?? {};
    if (t.name === 'min' || t.name === 'max') {
      const key = desc.type === 'string' ? `${t.name}Length` : desc.type === 'array' ? `${t.name}Items` : t.name === 'min' ? 'minimum' : 'maximum';
      schema[key] = limit[t.name];
    }
    if (t.name === 'email') schema.format = 'email';
    if (t.name === 'uuid') schema.format = 'uuid';
    if (t.name === 'integer') schema.type = 'integer';
  }
  if (desc.nullable) schema.nullable = true;
  return schema;
}

const STATUS_TEXT: Record<string, string> = {
  '400': 'Bad input: { error: { code, message, fields? } }',
  '401': 'No session, or the session expired or was revoked',
  '403': "The member's role may not use this route",
  '404': 'Not found in your shop',
  '409': 'Conflicts with the current state (stale revision, closed diagnosis…)',
  '422': 'Idempotency-Key reused with another body, or a procedure that cannot be published',
  '429': 'Rate limited',
};

/** The OpenAPI 3.1 description of the API, built from the one route table. */
export function buildOpenApi(routes: readonly RouteDef[]) {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const r of routes) {
    const path = r.path.replace(/:(\w+)/g, '{$1}');
    const params = [...r.path.matchAll(/:(\w+)/g)].map((m) => ({ name: m[1], in: 'path', required: true, schema: { type: 'string' } }));
    const idempotent = r.summary.includes('Idempotency-Key');
    if (idempotent) params.push({ name: 'Idempotency-Key', in: 'header', required: false, schema: { type: 'string' } } as never);
    paths[path] ??= {};
    paths[path][r.method] = {
      summary: r.summary,
      description: r.roles === 'public' ? 'Public: no sign-in.' : `Roles: ${r.roles.join(', ')}.`,
      'x-roles': r.roles,
      ...(r.roles === 'public' ? { security: [] } : {}),
      ...(params.length ? { parameters: params } : {}),
      ...(r.body ? { requestBody: { required: true, content: { 'application/json': { schema: toJsonSchema(r.body.describe()) } } } } : {}),
      responses: {
        '200': { description: 'Success (201 when something was created, 204 when there is no body)' },
        ...Object.fromEntries(
          Object.entries(STATUS_TEXT)
            .filter(([code]) => (r.roles === 'public' ? !['401', '403'].includes(code) : true))
            .map(([code, description]) => [code, { description }]),
        ),
      },
    };
  }
  return {
    openapi: '3.1.0',
    info: { title: 'Probepath API', version: '1', description: 'Guided electrical diagnosis for powersports and small-engine shops. Every record belongs to the shop of the signed-in member.' },
    servers: [{ url: '/' }],
    components: { securitySchemes: { bearer: { type: 'http', scheme: 'bearer', bearerFormat: 'JWT' } } },
    security: [{ bearer: [] }],
    paths,
  };
}
