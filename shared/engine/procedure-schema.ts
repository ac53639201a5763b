import * as yup from 'yup';
import { PICTURE_ID } from '../procedures/pictures';
import { CHECK_KINDS, MARGINAL_POLICIES, type ProcedureDocument } from './procedure';
import { METER_FUNCTIONS, QUANTITIES } from './quantity';
import { SPEC_KINDS, type SpecKind } from './spec';
import { VERDICTS } from './verdict';

/**
 * Shape of a stored procedure document, for the editor form and the API alike. It checks structure and
 * types; graph rules (reachability, loops, dominance…) are `validateProcedure`'s job before publishing.
 */

const MAX_CHECKS = 10_000;

const checkId = yup
  .string()
  .strict()
  .matches(/^[A-Za-z0-9][A-Za-z0-9_.:-]{0,63}$/, 'A check id is 1–64 letters, digits, “-”, “_”, “.” or “:”.')
  .required('Say which check.');

const text = (label: string, max: number) => yup.string().strict().max(max, `${label} has at most ${max} characters.`);
const requiredText = (label: string, max: number) =>
  text(label, max)
    .test('not-blank', `${label} can't be empty.`, (v) => v === undefined || v.trim() !== '')
    .required(`Enter the ${label.toLowerCase()}.`);

const number = (label: string) =>
  yup
    .number()
    .strict()
    .typeError(`${label} is a number.`)
    .test('finite', `${label} must be a finite number.`, (v) => v === undefined || Number.isFinite(v));

const unit = yup.string().strict().oneOf(['Ω', 'V', 'A', 'Hz', '°C'] as const, 'The unit is Ω, V, A, Hz or °C.');
const copperAt20C = yup.boolean().strict();

const wireRun = yup.object({
  gauge: yup
    .object({
      system: yup.string().strict().oneOf(['awg', 'mm2'] as const, 'Wire size is AWG or mm².').required('Say AWG or mm².'),
      size: number('Wire size').required('Enter the wire size.'),
    })
    .required(),
  lengthM: number('Wire length').required('Enter the wire length in metres.'),
});

const SPEC_SCHEMAS: Record<SpecKind, yup.AnyObjectSchema> = {
  window: yup.object({ kind: yup.string().required(), min: number('Minimum').required('Enter the minimum.'), max: number('Maximum').required('Enter the maximum.'), unit, copperAt20C }),
  nominal: yup.object({ kind: yup.string().required(), nominal: number('Nominal').required('Enter the nominal value.'), tolPct: number('Tolerance %'), tolAbs: number('Tolerance'), unit, copperAt20C }),
  at_most: yup.object({ kind: yup.string().required(), max: number('Maximum').required('Enter the maximum.'), unit, copperAt20C }),
  at_least: yup.object({ kind: yup.string().required(), min: number('Minimum').required('Enter the minimum.'), unit, copperAt20C }),
  expect_open: yup.object({ kind: yup.string().required(), openAbove: number('Open above'), unit }),
  expect_continuity: yup.object({ kind: yup.string().required(), max: number('Threshold').required('Enter the continuity threshold.'), unit }),
  record_only: yup.object({ kind: yup.string().required() }),
  ratio: yup.object({ kind: yup.string().required(), pairWith: checkId, minRatio: number('Minimum ratio').required('Enter the minimum ratio.') }),
  agree_with: yup.object({ kind: yup.string().required(), checkId, tolAbs: number('Tolerance'), tolPct: number('Tolerance %'), unit, wire: wireRun.default(undefined) }),
};

const specSchema = yup.lazy((value: unknown) => {
  const kind = (value as { kind?: unknown } | null)?.kind;
  return typeof kind === 'string' && Object.hasOwn(SPEC_SCHEMAS, kind)
    ? SPEC_SCHEMAS[kind as SpecKind].noUnknown('The spec has a field it does not use: ${unknown}.').required('Enter the spec.')
    : yup.object({ kind: yup.string().oneOf(SPEC_KINDS, `A spec is one of: ${SPEC_KINDS.join(', ')}.`).required('Pick a spec kind.') }).required('Enter the spec.');
});

const retest = yup
  .object({
    maxVisits: number('Visit limit').integer('The visit limit is a whole number.').min(1, 'Allow at least 1 visit.').max(20, 'At most 20 visits.').required('Enter the visit limit.'),
    whenExhausted: checkId,
  })
  .default(undefined);

const base = {
  id: checkId,
  kind: yup.string().strict().oneOf(CHECK_KINDS, `A check is one of: ${CHECK_KINDS.join(', ')}.`).required(),
  title: requiredText('Title', 120),
  instruction: text('Instruction', 4000).defined('Write the instruction (it may be empty).'),
  probe: yup
    .object({
      connector: text('Connector', 80),
      pins: yup.array(text('Pin', 20).required()).max(40),
      wireColours: yup.array(text('Wire colour', 40).required()).max(40),
    })
    .default(undefined),
  cautions: yup.array(requiredText('Caution', 500)).max(20, 'At most 20 cautions on a check.'),
  pictures: yup
    .array(
      yup
        .object({
          src: yup.string().strict().matches(PICTURE_ID, 'A picture is the id of a picture uploaded to this shop.').required('Say which picture.'),
          alt: requiredText('Picture description', 500),
        })
        .required(),
    )
    .max(20, 'At most 20 pictures on a check.'),
};

const outcomes = yup.object(Object.fromEntries(VERDICTS.map((v) => [v, checkId.optional()]))).noUnknown('${unknown} is not a verdict.').required('Say where each verdict leads.');

const CHECK_SCHEMAS = {
  measure: yup.object({
    ...base,
    quantity: yup.string().strict().oneOf(QUANTITIES, 'Pick what the check measures.').required('Pick what the check measures.'),
    meterFunction: yup.string().strict().oneOf(METER_FUNCTIONS, 'Pick a meter function.'),
    range: number('Range').positive('The range must be above 0.'),
    spec: specSchema,
    outcomes,
    marginalPolicy: yup.string().strict().oneOf(MARGINAL_POLICIES),
    retest,
  }),
  observe: yup.object({
    ...base,
    choices: yup
      .array(yup.object({ id: checkId, label: requiredText('Choice', 200), next: checkId }).required())
      .max(12, 'At most 12 observations to pick from.')
      .required('Add the observations to pick from.'),
    retest,
  }),
  task: yup.object({ ...base, next: checkId, retest }),
  finding: yup.object({
    ...base,
    finding: yup.object({ part: requiredText('Faulty part', 200), action: requiredText('Action', 1000) }).required('Name the part and the action.'),
  }),
};

const checkSchema = yup.lazy((value: unknown) => {
  const kind = (value as { kind?: unknown } | null)?.kind;
  return typeof kind === 'string' && Object.hasOwn(CHECK_SCHEMAS, kind)
    ? CHECK_SCHEMAS[kind as keyof typeof CHECK_SCHEMAS].noUnknown('The check has a field it does not use: ${unknown}.').required()
    : yup.object({ id: checkId, kind: base.kind }).required();
});

export const procedureDocumentSchema = yup
  .object({
    startCheckId: checkId,
    cautions: yup.array(requiredText('Caution', 500)).max(20, 'At most 20 cautions.').required('List the cautions (the list may be empty).'),
    marginalPolicy: yup.string().strict().oneOf(MARGINAL_POLICIES),
    checks: yup.array(checkSchema).min(1, 'Add at least one check.').max(MAX_CHECKS, `At most ${MAX_CHECKS} checks.`).required(),
  })
  .noUnknown('The procedure has a field it does not use: ${unknown}.');

export type ProcedureDocumentParse = { ok: true; document: ProcedureDocument } | { ok: false; errors: string[] };

/** Check an untrusted document (request body, stored JSON) and get it typed, or every error at once. */
export function parseProcedureDocument(input: unknown): ProcedureDocumentParse {
  try {
    const document = procedureDocumentSchema.validateSync(input, { abortEarly: false, strict: true });
    return { ok: true, document: document as ProcedureDocument };
  } catch (error) {
    if (error instanceof yup.ValidationError) return { ok: false, errors: error.errors };
    throw error;
  }
}
