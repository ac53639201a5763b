import type { MeasureCheck } from '@shared/engine/procedure';
import { type MeterFunction, QUANTITY_INFO } from '@shared/engine/quantity';
import { formatValue } from '@shared/engine/units';

const FUNCTION_WORDS: Record<MeterFunction, string> = {
  ohms: 'Ω (ohms)',
  continuity: 'Continuity',
  diode: 'Diode test',
  dc_volts: 'DC volts (V⎓)',
  ac_volts: 'AC volts (V~)',
  dc_amps: 'DC amps (A⎓), leads in the amps jack',
  ac_amps: 'AC amps (A~), leads in the amps jack',
  frequency: 'Frequency (Hz)',
  temperature: 'Temperature (°C)',
};

/** Where to set the dial: "Ω (ohms) · 600 Ω range" or "DC volts (V⎓) · autorange". */
export function meterSetting(check: Pick<MeasureCheck, 'quantity' | 'meterFunction' | 'range'>): { dial: string; range: string } {
  const fn = check.meterFunction ?? QUANTITY_INFO[check.quantity].meterFunctions[0];
  return {
    dial: FUNCTION_WORDS[fn],
    range: check.range === undefined ? 'Autorange' : `${formatValue(check.range, check.quantity)} range`,
  };
}
