import * as yup from 'yup';
import { parseReading } from '../engine/parse-reading';
import { CHECK_KINDS, MARGINAL_POLICIES, type Check, type CheckKind, type MarginalPolicy } from '../engine/procedure';
import { METER_FUNCTIONS, QUANTITIES, QUANTITY_INFO, type MeterFunction, type Quantity } from '../engine/quantity';
import { SPEC_KINDS, type Spec, type SpecKind } from '../engine/spec';
import { formatValue } from '../engine/units';
import { edgesOf } from './edges';

/**
 * The check form's values: everything as the author types it. Values carry their unit and prefix
 * ("0.4 kΩ", "12.6 V") and are read with the engine's reading parser, so the form accepts exactly what a
 * meter shows. Outcomes are edited on the document directly, not here.
 */
export interface CheckFormValues {
  kind: CheckKind;
  title: string;
  instruction: string;
  connector: string;
  /** Comma-separated. */
  pins: string;
  wireColours: string;
  /** Separated by “|”. */
  cautions: string;
  quantity: Quantity;
  meterFunction: MeterFunction | '';
  range: string;
  specKind: SpecKind;
  min: string;
  max: string;
  nominal: string;
  tolerance: string;
  toleranceIn: 'pct' | 'abs';
  openAbove: string;
  minRatio: string;
  refCheck: string;
  copperAt20C: boolean;
  marginalPolicy: MarginalPolicy | '';
  part: string;
  action: string;
  /** An observation's choices; where each leads is edited with the outcomes. */
  choices: ChoiceValues[];
  /** The check's pictures in the order shown: an uploaded picture's id and what it shows. */
  pictures: PictureValues[];
}

export interface PictureValues {
  src: string;
  alt: string;
}

/** The engine's procedure schema allows at most this many pictures on one check. */
export const MAX_PICTURES = 20;

/** The pictures with the one at `index` moved one place up (-1) or down (+1); unchanged at either end. */
export function movePicture(pictures: readonly PictureValues[], index: number, by: -1 | 1): PictureValues[] {
  const to = index + by;
  if (index < 0 || index >= pictures.length || to < 0 || to >= pictures.length) return [...pictures];
  const next = [...pictures];
  [next[index], next[to]] = [next[to], next[index]];
  return next;
}

export interface ChoiceValues {
  id: string;
  label: string;
}

/** The engine's procedure schema allows at most this many choices on one observation. */
export const MAX_CHOICES = 12;

/** A choice id not yet used on this check: "choice-3", "choice-4"… */
export function newChoiceId(choices: readonly ChoiceValues[]): string {
  const taken = new Set(choices.map((c) => c.id));
  let n = choices.length + 1;
  while (taken.has(`choice-${n}`)) n++;
  return `choice-${n}`;
}

/** What an observation offers when a check becomes one. */
export const DEFAULT_CHOICES: readonly ChoiceValues[] = [
  { id: 'seen', label: 'Seen' },
  { id: 'not-seen', label: 'Not seen' },
];

/** Which value fields each spec kind asks for. */
export const SPEC_FIELDS: Record<SpecKind, readonly ('min' | 'max' | 'nominal' | 'tolerance' | 'openAbove' | 'minRatio' | 'refCheck')[]> = {
  window: ['min', 'max'],
  nominal: ['nominal', 'tolerance'],
  at_most: ['max'],
  at_least: ['min'],
  expect_open: ['openAbove'],
  expect_continuity: ['max'],
  record_only: [],
  ratio: ['refCheck', 'minRatio'],
  agree_with: ['refCheck', 'tolerance'],
};

export const SPEC_LABELS: Record<SpecKind, string> = {
  window: 'Window',
  nominal: 'Nominal ±',
  at_most: 'At most',
  at_least: 'At least',
  expect_open: 'Open circuit',
  expect_continuity: 'Continuity',
  record_only: 'Record only',
  ratio: 'Ratio both ways',
  agree_with: 'Agrees with',
};

const COPPER_KINDS: readonly SpecKind[] = ['window', 'nominal', 'at_most', 'at_least'];

const uses = (values: { specKind?: SpecKind }, field: (typeof SPEC_FIELDS)[SpecKind][number]) =>
  values.specKind !== undefined && SPEC_FIELDS[values.specKind].includes(field);

/** A value with its unit, read as the check's quantity; `optional` lets it be blank. */
function reading(label: string, field: (typeof SPEC_FIELDS)[SpecKind][number], optional = false) {
  return yup.string().test('reading', function check(text) {
    const values = this.parent as CheckFormValues;
    if (values.kind !== 'measure' || !uses(values, field)) return true;
    if (!text?.trim()) return optional ? true : this.createError({ message: `Enter the ${label.toLowerCase()}, e.g. ${QUANTITY_INFO[values.quantity].example.split(/,| or /)[0]}.` });
    const parsed = parseReading(text, values.quantity);
    if (!parsed.ok) return this.createError({ message: `${label}: ${parsed.message}` });
    if (parsed.value === null) return this.createError({ message: `${label} must be a number, not over range.` });
    return true;
  });
}

const plainNumber = (label: string, field: 'minRatio' | 'tolerance') =>
  yup.string().test('number', function check(text) {
    const values = this.parent as CheckFormValues;
    if (values.kind !== 'measure' || !uses(values, field)) return true;
    if (field === 'tolerance' && values.toleranceIn === 'abs') return true;
    const n = Number((text ?? '').replace(',', '.'));
    if (!text?.trim() || !Number.isFinite(n) || n <= 0) return this.createError({ message: `${label} is a number above 0.` });
    return true;
  });

export const checkFormSchema = yup.object({
  kind: yup.string().oneOf(CHECK_KINDS).required(),
  title: yup.string().trim().max(120, 'The title has at most 120 characters.').required('Give the check a title.'),
  instruction: yup.string().max(4000, 'The instruction has at most 4000 characters.'),
  connector: yup.string().max(80, 'The connector has at most 80 characters.'),
  pins: yup.string().max(400),
  wireColours: yup.string().max(400),
  cautions: yup.string().test('cautions', 'At most 20 cautions of 500 characters each.', (v) => lines(v ?? '').length <= 20 && lines(v ?? '').every((l) => l.length <= 500)),
  quantity: yup.string().oneOf(QUANTITIES).required(),
  meterFunction: yup.string().oneOf(['', ...METER_FUNCTIONS]),
  range: yup.string().test('range', function check(text) {
    const values = this.parent as CheckFormValues;
    if (values.kind !== 'measure' || !text?.trim()) return true;
    const parsed = parseReading(text, values.quantity);
    if (!parsed.ok || parsed.value === null || parsed.value <= 0) return this.createError({ message: `The range is the meter's full scale, e.g. ${QUANTITY_INFO[values.quantity].example.split(/,| or /)[0]}; leave it empty for autorange.` });
    return true;
  }),
  specKind: yup.string().oneOf(SPEC_KINDS).required(),
  min: reading('Minimum', 'min'),
  max: reading(`Maximum`, 'max'),
  nominal: reading('Nominal value', 'nominal'),
  tolerance: plainNumber('Tolerance', 'tolerance').concat(
    yup.string().test('abs', function check(text) {
      const values = this.parent as CheckFormValues;
      if (values.kind !== 'measure' || !uses(values, 'tolerance') || values.toleranceIn !== 'abs') return true;
      const parsed = parseReading(text ?? '', values.quantity);
      if (!parsed.ok || parsed.value === null || parsed.value <= 0) return this.createError({ message: `Tolerance: enter a value with its unit, e.g. ${QUANTITY_INFO[values.quantity].example.split(/,| or /)[0]}.` });
      return true;
    }),
  ),
  toleranceIn: yup.string().oneOf(['pct', 'abs']).required(),
  openAbove: reading('Open above', 'openAbove', true),
  minRatio: plainNumber('Minimum ratio', 'minRatio'),
  refCheck: yup.string().test('ref', 'Pick the check whose reading this one is compared with.', function check(v) {
    const values = this.parent as CheckFormValues;
    return values.kind !== 'measure' || !uses(values, 'refCheck') || Boolean(v);
  }),
  copperAt20C: yup.boolean().required(),
  marginalPolicy: yup.string().oneOf(['', ...MARGINAL_POLICIES]),
  part: yup.string().test('part', 'Name the faulty part.', function check(v) {
    return (this.parent as CheckFormValues).kind !== 'finding' || Boolean(v?.trim());
  }).max(200),
  action: yup.string().test('action', 'Say what to do about it.', function check(v) {
    return (this.parent as CheckFormValues).kind !== 'finding' || Boolean(v?.trim());
  }).max(1000),
  choices: yup
    .array(
      yup.object({
        id: yup.string().required(),
        label: yup.string().trim().max(200, 'A choice has at most 200 characters.').required('Say what the technician sees, e.g. “Tester flashes”.'),
      }),
    )
    .required()
    .when('kind', {
      is: 'observe',
      then: (schema) =>
        schema
          .min(2, 'Give at least two observations to pick from.')
          .max(MAX_CHOICES, `At most ${MAX_CHOICES} observations to pick from.`)
          .test('distinct', 'Two choices say the same; make each one different.', (choices) => {
            const labels = (choices ?? []).map((c) => (c.label ?? '').trim().toLowerCase()).filter(Boolean);
            return new Set(labels).size === labels.length;
          }),
    }),
  pictures: yup
    .array(
      yup.object({
        src: yup.string().required(),
        alt: yup.string().trim().max(500, 'At most 500 characters.').required('Say what the picture shows, e.g. “Connector C3 from the wire side, pin 1 top left”.'),
      }),
    )
    .max(MAX_PICTURES, `At most ${MAX_PICTURES} pictures on a check.`)
    .required(),
});

const lines = (text: string) => text.split(/[\n|]/).map((l) => l.trim()).filter(Boolean);
const list = (text: string) => text.split(',').map((l) => l.trim()).filter(Boolean);

/** A value written so that reading it back gives the same number: "480 Ω", "12.65 V", "0.4 Ω" → "400 mΩ". */
export function formatExact(si: number, quantity: Quantity): string {
  for (let significant = 3; significant <= 15; significant++) {
    const text = formatValue(si, quantity, { significant });
    const back = parseReading(text, quantity);
    if (back.ok && back.value !== null && Math.abs(back.value - si) <= Math.abs(si) * 1e-12) return text;
  }
  return `${si} ${QUANTITY_INFO[quantity].symbol}`;
}

export function formValuesOf(check: Check): CheckFormValues {
  const measure = check.kind === 'measure' ? check : null;
  const quantity = measure?.quantity ?? 'resistance';
  const spec = measure?.spec;
  const v = (n: number | undefined) => (n === undefined ? '' : formatExact(n, quantity));
  const has = <K extends string>(key: K) => (spec && key in spec ? (spec as unknown as Record<K, number | string | undefined>)[key] : undefined);
  const tolPct = has('tolPct') as number | undefined;
  const tolAbs = has('tolAbs') as number | undefined;
  return {
    kind: check.kind,
    title: check.title,
    instruction: check.instruction,
    connector: check.probe?.connector ?? '',
    pins: (check.probe?.pins ?? []).join(', '),
    wireColours: (check.probe?.wireColours ?? []).join(', '),
    cautions: (check.cautions ?? []).join(' | '),
    quantity,
    meterFunction: measure?.meterFunction ?? '',
    range: measure?.range === undefined ? '' : formatExact(measure.range, quantity),
    specKind: spec?.kind ?? 'window',
    min: v(has('min') as number | undefined),
    max: v(has('max') as number | undefined),
    nominal: v(has('nominal') as number | undefined),
    tolerance: tolPct !== undefined ? String(tolPct) : tolAbs !== undefined ? formatExact(tolAbs, quantity) : '',
    toleranceIn: tolAbs !== undefined ? 'abs' : 'pct',
    openAbove: v(has('openAbove') as number | undefined),
    minRatio: spec?.kind === 'ratio' ? String(spec.minRatio) : '',
    refCheck: spec?.kind === 'ratio' ? spec.pairWith : spec?.kind === 'agree_with' ? spec.checkId : '',
    copperAt20C: spec !== undefined && 'copperAt20C' in spec && spec.copperAt20C === true,
    marginalPolicy: measure?.marginalPolicy ?? '',
    part: check.kind === 'finding' ? check.finding.part : '',
    action: check.kind === 'finding' ? check.finding.action : '',
    choices: check.kind === 'observe' ? check.choices.map((c) => ({ id: c.id, label: c.label })) : [],
    pictures: (check.pictures ?? []).map((p) => ({ src: p.src, alt: p.alt })),
  };
}

/**
 * The check the form describes, keeping the ways out of `previous` (its outcomes, choices, next step) when
 * the kind stays; a changed kind starts its ways out from where the old ones led. Expects valid values.
 */
export function checkFromForm(values: CheckFormValues, previous: Check): Check {
  const probe = {
    ...(values.connector.trim() ? { connector: values.connector.trim() } : {}),
    ...(list(values.pins).length ? { pins: list(values.pins) } : {}),
    ...(list(values.wireColours).length ? { wireColours: list(values.wireColours) } : {}),
  };
  const cautions = lines(values.cautions);
  const base = {
    id: previous.id,
    title: values.title.trim(),
    instruction: values.instruction,
    ...(Object.keys(probe).length ? { probe } : {}),
    ...(cautions.length ? { cautions } : {}),
    ...(values.pictures.length ? { pictures: values.pictures.map((p) => ({ src: p.src, alt: p.alt.trim() })) } : {}),
  };
  const onward = edgesOf(previous)[0]?.target ?? previous.id;
  const retest = previous.kind !== 'finding' && previous.retest ? { retest: previous.retest } : {};
  switch (values.kind) {
    case 'measure': {
      const range = values.range.trim() ? si(values.range, values.quantity) : undefined;
      return {
        ...base,
        kind: 'measure',
        quantity: values.quantity,
        ...(values.meterFunction ? { meterFunction: values.meterFunction } : {}),
        ...(range !== undefined ? { range } : {}),
        spec: specFromForm(values, previous),
        outcomes: previous.kind === 'measure' ? previous.outcomes : { in_spec: onward },
        ...(values.marginalPolicy ? { marginalPolicy: values.marginalPolicy } : {}),
        ...retest,
      };
    }
    case 'observe': {
      // A kept choice keeps where it leads; a new one starts where the check's first way out went.
      const was = new Map(previous.kind === 'observe' ? previous.choices.map((c) => [c.id, c.next]) : []);
      const choices = values.choices.map((c) => ({ id: c.id, label: c.label.trim(), next: was.get(c.id) ?? onward }));
      return { ...base, kind: 'observe', choices, ...retest };
    }
    case 'task':
      return { ...base, kind: 'task', next: previous.kind === 'task' ? previous.next : onward, ...retest };
    case 'finding':
      return { ...base, kind: 'finding', finding: { part: values.part.trim(), action: values.action.trim() } };
  }
}

function si(text: string, quantity: Quantity): number {
  const parsed = parseReading(text, quantity);
  return parsed.ok && parsed.value !== null ? parsed.value : NaN;
}

function specFromForm(values: CheckFormValues, previous: Check): Spec {
  const q = values.quantity;
  const unit = QUANTITY_INFO[q].symbol;
  const copper = COPPER_KINDS.includes(values.specKind) && values.copperAt20C ? { copperAt20C: true } : {};
  const tolerance =
    values.toleranceIn === 'pct' ? { tolPct: Number(values.tolerance.replace(',', '.')) } : { tolAbs: si(values.tolerance, q) };
  switch (values.specKind) {
    case 'window':
      return { kind: 'window', min: si(values.min, q), max: si(values.max, q), unit, ...copper };
    case 'nominal':
      return { kind: 'nominal', nominal: si(values.nominal, q), ...tolerance, unit, ...copper };
    case 'at_most':
      return { kind: 'at_most', max: si(values.max, q), unit, ...copper };
    case 'at_least':
      return { kind: 'at_least', min: si(values.min, q), unit, ...copper };
    case 'expect_open':
      return { kind: 'expect_open', ...(values.openAbove.trim() ? { openAbove: si(values.openAbove, q) } : {}), unit };
    case 'expect_continuity':
      return { kind: 'expect_continuity', max: si(values.max, q), unit };
    case 'record_only':
      return { kind: 'record_only' };
    case 'ratio':
      return { kind: 'ratio', pairWith: values.refCheck, minRatio: Number(values.minRatio.replace(',', '.')) };
    case 'agree_with': {
      const wire = previous.kind === 'measure' && previous.spec.kind === 'agree_with' && previous.spec.wire ? { wire: previous.spec.wire } : {};
      return { kind: 'agree_with', checkId: values.refCheck, ...tolerance, unit, ...wire };
    }
  }
}
