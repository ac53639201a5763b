import { QUANTITY_INFO, type Dimension, type Quantity, type QuantityInfo } from './quantity';
import {
  FUSED_UNIT_WORDS,
  PREFIX_SYMBOLS,
  PREFIX_WORDS,
  SI_PREFIXES,
  UNIT_SPELLINGS,
  prefixSymbol,
  scaleByPowerOfTen,
} from './units';

export interface ParsedReading {
  ok: true;
  /** SI value (Ω, V, A, Hz, °C); null when the meter showed over range. */
  value: number | null;
  overRange: boolean;
  quantity: Quantity;
  /** Prefix and unit as understood ("kΩ", "mV", "°F"); absent for a bare number, which takes the check's unit. */
  unitTyped?: string;
  acdc?: 'ac' | 'dc';
  /** The reading in canonical form: decimal point, one space, SI symbols ("0.48 kΩ", "OL"). */
  normalized: string;
}

export interface ParseFailure {
  ok: false;
  /** Plain trade words saying what is wrong and what to type instead. */
  message: string;
}

export type ParseResult = ParsedReading | ParseFailure;

/** Longer than any meter display plus a unit; anything longer is pasted text, not a reading. */
const MAX_TEXT_LENGTH = 40;
/** Beyond the highest range of any shop meter (GΩ); larger numbers are typos. */
const MAX_MAGNITUDE = 1e12;

const DOT = 46;
const COMMA = 44;
const PLUS = 43;
const HYPHEN_MINUS = 45;
const MINUS_SIGN = 0x2212;

interface UnitMatch {
  readonly dimension: Dimension | null;
  readonly exponent: number;
  /** Unit symbol without prefix; '' when only a prefix was typed ("4.7k"). */
  readonly symbol: string;
  readonly fahrenheit: boolean;
}

const DIMENSION_SYMBOL: Record<Dimension, string> = {
  resistance: 'Ω',
  voltage: 'V',
  current: 'A',
  frequency: 'Hz',
  temperature: '°C',
};

const DIMENSION_WORD: Record<Dimension, string> = {
  resistance: 'resistance',
  voltage: 'voltage',
  current: 'current',
  frequency: 'frequency',
  temperature: 'temperature',
};

const UNIT_NAME: Record<Dimension, string> = {
  resistance: 'ohms',
  voltage: 'volts',
  current: 'amperes',
  frequency: 'hertz',
  temperature: 'degrees',
};

const FAHRENHEIT_SPELLINGS = new Set(['°f', 'f', 'degf', 'fahrenheit']);

const UNITS_BY_SPELLING = new Map<string, UnitMatch>();
for (const dimension of Object.keys(UNIT_SPELLINGS) as Dimension[]) {
  for (const spelling of UNIT_SPELLINGS[dimension]) {
    const fahrenheit = FAHRENHEIT_SPELLINGS.has(spelling);
    UNITS_BY_SPELLING.set(spelling, {
      dimension,
      exponent: 0,
      symbol: fahrenheit ? '°F' : DIMENSION_SYMBOL[dimension],
      fahrenheit,
    });
  }
}

/** Over-range words; `openOnly` ones only make sense where OL means an open circuit. */
const OVER_RANGE_WORDS: readonly (readonly [word: string, openOnly: boolean])[] = [
  ['overload', false],
  ['infinity', true],
  ['o.l.', false],
  ['o.l', false],
  ['open', true],
  ['inf', true],
  ['ol', false],
  ['∞', true],
];

export function parseReading(text: string, quantity: Quantity): ParseResult {
  const info = QUANTITY_INFO[quantity];
  if (typeof text !== 'string') return fail(`Type the reading shown on the meter, e.g. ${info.example}.`);
  if (text.length > MAX_TEXT_LENGTH) {
    return fail(`That is too long for a meter reading. Type just the number and unit, e.g. ${info.example}.`);
  }
  const s = needsNormalizing(text) ? text.normalize('NFKC') : text;
  let start = 0;
  let end = s.length;
  while (start < end && isSpace(s.charCodeAt(start))) start++;
  while (end > start && isSpace(s.charCodeAt(end - 1))) end--;
  if (start === end) return fail(`Type the reading shown on the meter, e.g. ${info.example}.`);

  let i = start;
  let negative = false;
  let c = s.charCodeAt(i);
  if (c === HYPHEN_MINUS || c === MINUS_SIGN) {
    negative = true;
    i++;
  } else if (c === PLUS) {
    i++;
  }

  const numberStart = i;
  let mantissa = 0;
  let digits = 0;
  let integerPart = 0;
  let separator = 0;
  let separatorAt = -1;
  let fractionDigits = 0;
  for (; i < end; i++) {
    c = s.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      mantissa = mantissa * 10 + (c - 48);
      digits++;
      if (separator !== 0) fractionDigits++;
    } else if (c === DOT || c === COMMA) {
      if (separator !== 0) {
        return fail(`Type the number with one decimal point and no thousands separators, e.g. ${info.example}.`);
      }
      separator = c;
      separatorAt = i;
      integerPart = mantissa;
    } else {
      break;
    }
  }

  if (digits === 0) return parseOverRange(s, numberStart, end, negative, info, quantity);

  if (separator === COMMA && fractionDigits === 3 && integerPart > 0) {
    // "1,500" is 1.5 with a decimal comma but 1500 with a thousands comma; guessing could swap a pass and a fail.
    const whole = s.slice(numberStart, separatorAt);
    const fraction = s.slice(separatorAt + 1, separatorAt + 4);
    return fail(
      `Is that ${whole}.${fraction} or ${whole}${fraction}? Meters don't show thousands separators: type ${whole}.${fraction} or ${whole}${fraction}.`,
    );
  }

  let exponent = 0;
  if (i < end && (c === 101 || c === 69)) {
    let j = i + 1;
    let exponentNegative = false;
    const sign = s.charCodeAt(j);
    if (sign === PLUS || sign === HYPHEN_MINUS) {
      exponentNegative = sign === HYPHEN_MINUS;
      j++;
    }
    let exponentDigits = 0;
    for (; j < end; j++) {
      const d = s.charCodeAt(j);
      if (d < 48 || d > 57) break;
      // Cap the accumulated exponent: anything this large is rejected as absurd below anyway.
      if (exponent < 1000) exponent = exponent * 10 + (d - 48);
      exponentDigits++;
    }
    if (exponentDigits > 0) {
      if (exponentNegative) exponent = -exponent;
      i = j;
    }
  }
  const numberEnd = i;

  while (i < end && isSpace(s.charCodeAt(i))) i++;
  let unit: UnitMatch | null = null;
  let acdc: 'ac' | 'dc' | undefined;
  if (i < end) {
    const unitResult = parseUnitText(s.slice(i, end), info, quantity);
    if (!unitResult.ok) return unitResult;
    unit = unitResult.unit;
    acdc = unitResult.acdc;
  }

  if (negative && !info.signed) return fail(negativeMessage(info));

  const unitExponent = unit === null ? 0 : unit.exponent;
  let value =
    mantissa <= Number.MAX_SAFE_INTEGER
      ? scaleByPowerOfTen(mantissa, exponent - fractionDigits + unitExponent)
      : scaleByPowerOfTen(Number(numberText(s, numberStart, numberEnd, separatorAt)), unitExponent);
  if (!(Math.abs(value) <= MAX_MAGNITUDE)) {
    return fail(`That number is far beyond anything a meter shows. Type the reading as displayed, e.g. ${info.example}.`);
  }
  if (negative && value !== 0) value = -value;
  if (value === 0) value = 0; // fold -0 so stored readings compare equal
  if (unit !== null && unit.fahrenheit) value = ((value - 32) * 5) / 9;

  const typed = unitLabel(unit, info);
  const sign = negative && value !== 0 ? '-' : '';
  return {
    ok: true,
    value,
    overRange: false,
    quantity,
    unitTyped: typed,
    acdc,
    normalized: `${sign}${numberText(s, numberStart, numberEnd, separatorAt)} ${typed ?? info.symbol}`,
  };
}

function parseOverRange(
  s: string,
  from: number,
  end: number,
  negative: boolean,
  info: QuantityInfo,
  quantity: Quantity,
): ParseResult {
  const rest = s.slice(from, end);
  const lower = rest.toLowerCase();
  for (const [word, openOnly] of OVER_RANGE_WORDS) {
    if (!lower.startsWith(word)) continue;
    if (openOnly && !info.opensOnOverRange) {
      return fail(
        `“${rest}” is for an open circuit on a resistance or diode check. Here type the ${info.noun} shown, or OL if the meter shows over range.`,
      );
    }
    if (negative) {
      return fail(
        'The meter shows over range with a minus sign: swap the leads or pick a higher range, then type the reading.',
      );
    }
    const unitText = rest.slice(word.length).trim();
    let unitTyped: string | undefined;
    let acdc: 'ac' | 'dc' | undefined;
    if (unitText !== '') {
      const unitResult = parseUnitText(unitText, info, quantity);
      if (!unitResult.ok) return unitResult;
      acdc = unitResult.acdc;
      unitTyped = unitLabel(unitResult.unit, info);
    }
    return { ok: true, value: null, overRange: true, quantity, unitTyped, acdc, normalized: 'OL' };
  }
  return fail(
    `“${s.slice(from - (negative ? 1 : 0), end)}” isn't a reading. Type the number on the meter's display, e.g. ${info.example}${info.opensOnOverRange ? '' : ', or OL if it shows over range'}.`,
  );
}

type UnitParse = { ok: true; unit: UnitMatch | null; acdc: 'ac' | 'dc' | undefined } | ParseFailure;

/**
 * Unit texts repeat endlessly ("kΩ", "V", "mA"), so their parses are remembered per quantity. Bounded, so
 * arbitrary input can't grow it without limit; results are never mutated.
 */
const UNIT_CACHE_LIMIT = 512;
const unitCache = new Map<Quantity, Map<string, UnitParse>>();

function parseUnitText(raw: string, info: QuantityInfo, quantity: Quantity): UnitParse {
  let cache = unitCache.get(quantity);
  if (cache === undefined) {
    cache = new Map();
    unitCache.set(quantity, cache);
  }
  let parsed = cache.get(raw);
  if (parsed === undefined) {
    parsed = parseUnitTextUncached(raw, info, quantity);
    if (cache.size < UNIT_CACHE_LIMIT) cache.set(raw, parsed);
  }
  return parsed;
}

/** Reads "kΩ", "mV DC", "V~", "ohms" … and checks it fits the quantity. */
function parseUnitTextUncached(raw: string, info: QuantityInfo, quantity: Quantity): UnitParse {
  const compact = hasSpace(raw) ? raw.replace(/\s+/g, '') : raw;
  for (let k = 0; k < compact.length; k++) {
    const code = compact.charCodeAt(k);
    if (code >= 48 && code <= 57) return fail(`Type one reading at a time, e.g. ${info.example}.`);
  }
  const lower = compact.toLowerCase();
  let from = 0;
  let to = compact.length;
  let sawAc = false;
  let sawDc = false;
  // Designators may trail ("V AC", "Vrms", "V~") or lead as on a dial label ("ACV"); at most one of each place.
  for (let pass = 0; pass < 2; pass++) {
    if (lower.endsWith('rms', to) && to - 3 >= from) {
      sawAc = true;
      to -= 3;
    } else if (lower.endsWith('ac', to) && to - 2 >= from) {
      sawAc = true;
      to -= 2;
    } else if (lower.endsWith('dc', to) && to - 2 >= from) {
      sawDc = true;
      to -= 2;
    } else if (to > from && (lower.charCodeAt(to - 1) === 0x7e || lower.charCodeAt(to - 1) === 0x2393)) {
      if (lower.charCodeAt(to - 1) === 0x7e) sawAc = true;
      else sawDc = true;
      to -= 1;
    }
  }
  if (to - from > 2 && (lower.startsWith('ac', from) || lower.startsWith('dc', from))) {
    if (lower.startsWith('ac', from)) sawAc = true;
    else sawDc = true;
    from += 2;
  }
  if (sawAc && sawDc) return fail(`A reading is either AC or DC, not both. Type it as e.g. ${info.example}.`);
  const acdc = sawAc ? 'ac' : sawDc ? 'dc' : undefined;
  if (acdc !== undefined && info.acdc !== acdc) {
    return fail(
      info.acdc === null
        ? `AC/DC doesn't apply to ${info.noun}. Type the reading without it, e.g. ${info.example}.`
        : `This check reads ${info.noun}, but you typed ${acdc.toUpperCase()}. Set the meter to ${info.noun} and type the reading, e.g. ${info.example}.`,
    );
  }

  const core = from === 0 && to === compact.length ? compact : compact.slice(from, to);
  if (core === '') return { ok: true, unit: null, acdc };
  const unit = matchUnit(core, from === 0 && to === lower.length ? lower : lower.slice(from, to));
  if (unit === null) {
    return fail(
      `“${raw}” isn't a unit for ${info.noun}. Type the number with its unit or just the number, e.g. ${info.example}.`,
    );
  }
  if (unit.dimension !== null && unit.dimension !== info.dimension) {
    return fail(
      `${unit.symbol} is a ${DIMENSION_WORD[unit.dimension]} unit, but this check reads ${info.noun}. Set the meter to ${info.noun} and type the reading, e.g. ${info.example}.`,
    );
  }
  if (!info.prefixExponents.includes(unit.exponent)) return fail(prefixMessage(core, unit, info, quantity));
  return { ok: true, unit, acdc };
}

function matchUnit(core: string, lower: string): UnitMatch | null {
  const plain = UNITS_BY_SPELLING.get(lower);
  if (plain !== undefined) return plain;
  const fused = FUSED_UNIT_WORDS.get(lower);
  if (fused !== undefined) return { dimension: fused[0], exponent: fused[1], symbol: DIMENSION_SYMBOL[fused[0]], fahrenheit: false };
  for (const [word, exponent] of PREFIX_WORDS) {
    if (lower.startsWith(word)) {
      const prefixed = withPrefix(lower.slice(word.length), exponent);
      if (prefixed !== null) return prefixed;
    }
  }
  const exponent = PREFIX_SYMBOLS.get(core[0]);
  return exponent === undefined ? null : withPrefix(lower.slice(1), exponent);
}

function withPrefix(unitSpelling: string, exponent: number): UnitMatch | null {
  if (unitSpelling === '') return { dimension: null, exponent, symbol: '', fahrenheit: false };
  const unit = UNITS_BY_SPELLING.get(unitSpelling);
  return unit === undefined ? null : { dimension: unit.dimension, exponent, symbol: unit.symbol, fahrenheit: unit.fahrenheit };
}

function prefixMessage(core: string, unit: UnitMatch, info: QuantityInfo, quantity: Quantity): string {
  if (quantity === 'temperature') return `Type temperatures without a prefix, e.g. ${info.example}.`;
  const name = SI_PREFIXES.find((p) => p.exponent === unit.exponent)?.name ?? '';
  const caseHint =
    unit.exponent === 6 && info.prefixExponents.includes(-3)
      ? ` For milli- use a small m (m${info.symbol}).`
      : unit.exponent === -3 && info.prefixExponents.includes(6)
        ? ` For mega- use a capital M (M${info.symbol}).`
        : '';
  return `“${core}” would mean ${name}${UNIT_NAME[info.dimension]}, far outside what this check reads.${caseHint} Type it like ${info.example}.`;
}

function negativeMessage(info: QuantityInfo): string {
  return `${info.noun[0].toUpperCase()}${info.noun.slice(1)} can't be negative. Check the leads and the meter's zero, then type the reading without a minus sign, e.g. ${info.example}.`;
}

/** A bare prefix ("4.7k") is understood as that prefix of the check's unit. */
function unitLabel(unit: UnitMatch | null, info: QuantityInfo): string | undefined {
  return unit === null ? undefined : prefixSymbol(unit.exponent) + (unit.symbol === '' ? info.symbol : unit.symbol);
}

/** The typed number with a decimal point: "0,48" → "0.48", ".5" → "0.5", "12." → "12". */
function numberText(s: string, from: number, to: number, separatorAt: number): string {
  if (separatorAt < 0) return s.slice(from, to);
  const whole = separatorAt === from ? '0' : s.slice(from, separatorAt);
  return separatorAt + 1 === to ? whole : `${whole}.${s.slice(separatorAt + 1, to)}`;
}

function fail(message: string): ParseFailure {
  return { ok: false, message };
}

/**
 * Characters NFKC leaves unchanged that readings often carry (Ω U+03A9, μ U+03BC, °, −, ∞, ⎓). Text made only
 * of these and ASCII skips normalisation, which is by far the slowest step of a parse.
 */
const NFKC_STABLE = new Set([0x03a9, 0x03c9, 0x03bc, 0x00b0, 0x2212, 0x221e, 0x2393]);

function needsNormalizing(s: string): boolean {
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c > 127 && !NFKC_STABLE.has(c)) return true;
  }
  return false;
}

function isSpace(c: number): boolean {
  return c === 32 || c === 9 || c === 10 || c === 13;
}

function hasSpace(s: string): boolean {
  for (let i = 0; i < s.length; i++) if (isSpace(s.charCodeAt(i))) return true;
  return false;
}
