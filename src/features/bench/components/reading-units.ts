import type { Quantity } from '@shared/engine/quantity';

/** The unit buttons offered under the reading for each quantity: what a shop meter shows on that function. */
export const UNIT_CHIPS: Record<Quantity, readonly string[]> = {
  resistance: ['Ω', 'kΩ', 'MΩ'],
  continuity: ['Ω', 'kΩ'],
  diode: ['V', 'mV'],
  voltage_dc: ['V', 'mV'],
  voltage_ac: ['V', 'mV'],
  current_dc: ['A', 'mA'],
  current_ac: ['A', 'mA'],
  frequency: ['Hz', 'kHz'],
  temperature: ['°C'],
};

/** Over range: offered wherever a meter can show it. */
export const OVER_RANGE = 'OL';

/** Text that already names its own unit or is a word ("0.45k", "OL", "open"); the unit buttons then stand aside. */
export function namesItsUnit(text: string): boolean {
  return /[^\d\s.,+\-−]/.test(text);
}

/** The reading as recorded: what was typed, with the chosen unit when the typing gave none. */
export function composeReading(text: string, unit: string): string {
  const typed = text.trim();
  if (!typed || namesItsUnit(typed)) return typed;
  return `${typed} ${unit}`;
}
