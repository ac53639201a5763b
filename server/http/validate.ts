import type { RequestHandler } from 'express';
import * as yup from 'yup';
import { ApiError } from './api-error';
import { fieldsOf } from './error-middleware';

/**
 * Runs the same yup schema the client form uses. Unknown top-level fields are
 * refused rather than dropped, so a body cannot smuggle e.g. a shopId.
 */
export function validateBody(schema: yup.AnyObjectSchema): RequestHandler {
  const known = new Set(Object.keys(schema.fields));
  return async (req, _res, next) => {
    const body: unknown = req.body;
    if (body === undefined || body === null || typeof body !== 'object' || Array.isArray(body)) {
      throw new ApiError(400, 'invalid_input', 'Send a JSON object as the request body.');
    }
    const unknown = Object.keys(body).filter((k) => !known.has(k));
    if (unknown.length) {
      throw new ApiError(
        400,
        'unknown_field',
        `Unknown field${unknown.length > 1 ? 's' : ''}: ${unknown.slice(0, 5).join(', ')}.`,
        Object.fromEntries(unknown.slice(0, 20).map((k) => [k, 'This field is not accepted here.'])),
      );
    }
    const mistyped = wrongTypes(schema, body as Record<string, unknown>);
    if (Object.keys(mistyped).length) {
      throw new ApiError(400, 'invalid_input', Object.values(mistyped).join(' '), mistyped);
    }
    try {
      req.body = await schema.validate(body, { abortEarly: false, stripUnknown: false });
    } catch (err) {
      if (err instanceof yup.ValidationError) {
        throw new ApiError(400, 'invalid_input', err.errors.join(' '), fieldsOf(err));
      }
      // A transform met a value of a type it cannot handle: still the sender's mistake.
      throw new ApiError(400, 'invalid_input', 'A field has a value of the wrong type.');
    }
    next();
  };
}

const JSON_TYPE: Record<string, string> = { string: 'text', number: 'a number', boolean: 'true or false', object: 'an object', array: 'a list' };

/** Yup's string transforms (trim, lowercase) would throw on an object, so top-level types are checked first. */
function wrongTypes(schema: yup.AnyObjectSchema, body: Record<string, unknown>): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const [key, value] of Object.entries(body)) {
    if (value === undefined || value === null) continue;
    const expected = (schema.fields[key] as yup.Schema).type;
    const actual = Array.isArray(value) ? 'array' : typeof value;
    const fits = expected === 'mixed' || expected === actual || (expected === 'number' && actual === 'string' && value !== '');
    if (!fits && expected in JSON_TYPE) fields[key] = `${key} must be ${JSON_TYPE[expected]}.`;
  }
  return fields;
}
