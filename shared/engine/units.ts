import { QUANTITY_INFO, type Dimension, type Quantity } from './quantity';

/** The SI prefixes a shop meter uses (BIPM, The International System of Units, 9th ed., Table 7). */
export const SI_PREFIXES = [
  { symbol: 'G', name: 'giga', exponent: 9 },
  { symbol: 'M', name: 'mega', exponent: 6 },
  { symbol: 'k', name: 'kilo', exponent: 3 },
  { symbol: 'm', name: 'milli', exponent: -3 },
  { symbol: 'µ', name: 'micro', exponent: -6 },
  { symbol: 'n', name: 'nano', exponent: -9 },
] as const;

const PREFIX_SYMBOL_BY_EXPONENT = new Map<number, string>([[0, ''], ...SI_PREFIXES.map((p) => [p.exponent, p.symbol] as const)]);

/** Display symbol of a power-of-ten prefix ('' for none). */
export function prefixSymbol(exponent: number): string {
  return PREFIX_SYMBOL_BY_EXPONENT.get(exponent) ?? '';
}

/** Exact powers of ten: 10^0 … 10^22 are all representable, so scaling by them rounds once. */
const POW10: readonly number[] = Array.from({ length: 23 }, (_, i) => Number(`1e${i}`));

/** Multiply by 10^exponent with a single rounding whenever the power is exactly representable. */
export function scaleByPowerOfTen(value: number, exponent: number): number {
  if (exponent >= 0) return exponent <= 22 ? value * POW10[exponent] : value * 10 ** exponent;
  return -exponent <= 22 ? value / POW10[-exponent] : value / 10 ** -exponent;
}

export interface FormatOptions {
  /** Significant digits shown (default 3, what a 4-digit display makes meaningful for spec windows). */
  significant?: number;
}

/**
 * An SI value with the nearest engineering prefix this quantity's readings use: 480 → "480 Ω",
 * 0.085 → "85 mA", 1500 → "1.50 kΩ". A fraction of only zeros is dropped (whole numbers read cleaner
 * on a phone); any other fraction keeps its trailing zeros so the shown precision stays honest.
 */
export function formatValue(si: number, quantity: Quantity, options: FormatOptions = {}): string {
  const info = QUANTITY_INFO[quantity];
  if (!Number.isFinite(si)) return `— ${info.symbol}`;
  if (si === 0) return `0 ${info.symbol}`;
  const significant = options.significant ?? 3;
  const exponents = info.prefixExponents;
  const magnitude = Math.abs(si);
  let index = 0;
  for (let i = exponents.length - 1; i >= 0; i--) {
    if (magnitude >= 10 ** exponents[i]) {
      index = i;
      break;
    }
  }
  let mantissa = scaleByPowerOfTen(si, -exponents[index]);
  let text = mantissa.toPrecision(significant);
  // Rounding can carry into the next prefix (999.7 → "1.00e+3"): move up a prefix when there is one.
  if (Math.abs(Number(text)) >= 1000 && index < exponents.length - 1) {
    index++;
    mantissa = scaleByPowerOfTen(si, -exponents[index]);
    text = mantissa.toPrecision(significant);
  }
  // Past the largest prefix, show every integer digit rather than exponent notation.
  const rounded = Math.abs(Number(text));
  if (rounded >= 1000) text = mantissa.toPrecision(Math.max(significant, Math.floor(Math.log10(rounded)) + 1));
  return `${dropZeroFraction(text)} ${prefixSymbol(exponents[index])}${info.symbol}`;
}

function dropZeroFraction(text: string): string {
  const dot = text.indexOf('.');
  if (dot < 0 || text.includes('e')) return text;
  for (let i = dot + 1; i < text.length; i++) if (text[i] !== '0') return text;
  return text.slice(0, dot);
}

/**
 * Unit words and symbols a technician may type, lower-cased (matching ignores case; prefixes do not).
 * Symbols only appear here when they have no prefix ambiguity.
 */
export const UNIT_SPELLINGS: Readonly<Record<Dimension, readonly string[]>> = {
  resistance: ['ω', 'ohm', 'ohms'],
  voltage: ['v', 'volt', 'volts'],
  current: ['a', 'amp', 'amps', 'ampere', 'amperes'],
  frequency: ['hz', 'hertz'],
  temperature: ['°c', 'c', 'degc', 'celsius', '°f', 'f', 'degf', 'fahrenheit'],
};

/** Prefix words typed in full ("millivolts", "megaohm"); "meg" is shop talk for megohms. */
export const PREFIX_WORDS: readonly (readonly [word: string, exponent: number])[] = [
  ['giga', 9],
  ['mega', 6],
  ['meg', 6],
  ['kilo', 3],
  ['milli', -3],
  ['micro', -6],
  ['nano', -9],
];

/** Prefix symbols, case-sensitive. "K" is tolerated for kilo (no other prefix uses it); "u" stands in for µ. */
export const PREFIX_SYMBOLS: ReadonlyMap<string, number> = new Map([
  ['G', 9],
  ['M', 6],
  ['k', 3],
  ['K', 3],
  ['m', -3],
  ['µ', -6],
  ['μ', -6],
  ['u', -6],
  ['n', -9],
]);

/** Words where prefix and unit fuse irregularly. */
export const FUSED_UNIT_WORDS: ReadonlyMap<string, readonly [Dimension, number]> = new Map([
  ['kilohm', ['resistance', 3]],
  ['kilohms', ['resistance', 3]],
  ['megohm', ['resistance', 6]],
  ['megohms', ['resistance', 6]],
]);
