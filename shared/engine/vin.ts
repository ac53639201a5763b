/**
 * Vehicle identification number checks. The structure (17 characters, no I, O or Q) is universal; the check
 * digit in position 9 is a North American rule (49 CFR 565), so a wrong check digit is only a warning —
 * machines built for other markets need not carry one.
 */
export type VinCheck =
  | { ok: true; vin: string; checkDigit: { expected: string; found: string }; warning?: string }
  | { ok: false; message: string };

const WEIGHTS = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2];

/** 49 CFR 565 transliteration of letters to numbers; I, O and Q are absent because they never appear. */
const LETTER_VALUES: Record<string, number> = {
  A: 1, B: 2, C: 3, D: 4, E: 5, F: 6, G: 7, H: 8,
  J: 1, K: 2, L: 3, M: 4, N: 5, P: 7, R: 9,
  S: 2, T: 3, U: 4, V: 5, W: 6, X: 7, Y: 8, Z: 9,
};

function characterValue(ch: string): number | undefined {
  const code = ch.charCodeAt(0);
  if (code >= 48 && code <= 57) return code - 48;
  return LETTER_VALUES[ch];
}

/** The check digit a 17-character VIN should carry: weighted sum mod 11, with 10 written as X. */
export function vinCheckDigit(vin: string): string | undefined {
  if (vin.length !== 17) return undefined;
  let sum = 0;
  for (let i = 0; i < 17; i++) {
    const value = characterValue(vin[i]);
    if (value === undefined) return undefined;
    sum += value * WEIGHTS[i];
  }
  const remainder = sum % 11;
  return remainder === 10 ? 'X' : String(remainder);
}

export function checkVin(input: string): VinCheck {
  const vin = input.trim().toUpperCase();
  if (vin.length !== 17) {
    return { ok: false, message: `A VIN has 17 characters; this one has ${vin.length}. Copy it again from the frame or plate.` };
  }
  for (const ch of vin) {
    if (ch === 'I' || ch === 'O' || ch === 'Q') {
      return { ok: false, message: `A VIN never contains I, O or Q. Check whether “${ch}” is really ${ch === 'I' ? '1' : '0'}.` };
    }
    if (characterValue(ch) === undefined) {
      return { ok: false, message: `“${ch}” can't be in a VIN: only digits and the letters A–Z except I, O and Q.` };
    }
  }
  const expected = vinCheckDigit(vin) as string; // every character was checked above
  const found = vin[8];
  return expected === found
    ? { ok: true, vin, checkDigit: { expected, found } }
    : {
        ok: true,
        vin,
        checkDigit: { expected, found },
        warning: `The check digit (9th character) is ${found} but should be ${expected} for a North American VIN. Re-read the VIN; machines built for other markets may not use a check digit.`,
      };
}
