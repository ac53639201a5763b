import type { MeterRange } from '@shared/workshop/schemas';

/**
 * Demo content: the invented demo shop's meters. Makers, models and accuracy tables are made up, in the
 * form meter makers publish them: ±(% of reading + counts) per function and range, where one count is the
 * range's full scale divided by the display counts (a 6000-count meter resolves 0.01 V on its 60 V range).
 */

export type DemoMeterKey = 'bench' | 'pocket' | 'clamp';

export interface DemoMeter {
  key: DemoMeterKey;
  name: string;
  model: string;
  ranges: MeterRange[];
}

const r = (fn: MeterRange['function'], rangeMax: number, resolution: number, pctOfReading: number, counts: number): MeterRange => ({
  function: fn,
  rangeMax,
  resolution,
  pctOfReading,
  counts,
});

export const DEMO_METERS: readonly DemoMeter[] = [
  {
    key: 'bench',
    name: 'Bench meter 1',
    model: 'Pellam DM-600 (6000 counts)',
    ranges: [
      r('dc_volts', 0.6, 0.0001, 0.5, 2),
      r('dc_volts', 6, 0.001, 0.5, 2),
      r('dc_volts', 60, 0.01, 0.5, 2),
      r('dc_volts', 600, 0.1, 0.5, 2),
      r('ac_volts', 6, 0.001, 1.0, 3),
      r('ac_volts', 60, 0.01, 1.0, 3),
      r('ac_volts', 600, 0.1, 1.0, 3),
      r('ohms', 60, 0.01, 1.0, 5),
      r('ohms', 600, 0.1, 0.8, 3),
      r('ohms', 6_000, 1, 0.8, 3),
      r('ohms', 60_000, 10, 0.8, 3),
      r('ohms', 600_000, 100, 0.8, 3),
      r('ohms', 6_000_000, 1_000, 1.5, 3),
      r('continuity', 600, 0.1, 0.8, 3),
      r('diode', 3, 0.001, 1.0, 3),
      r('dc_amps', 0.06, 0.00001, 1.2, 3),
      r('dc_amps', 0.6, 0.0001, 1.2, 3),
      r('dc_amps', 6, 0.001, 1.2, 3),
      r('dc_amps', 10, 0.01, 1.5, 3),
    ],
  },
  {
    key: 'pocket',
    name: 'Pocket meter (Tomás)',
    model: 'Brindle P-40 (4000 counts)',
    ranges: [
      r('dc_volts', 0.4, 0.0001, 0.8, 3),
      r('dc_volts', 4, 0.001, 0.8, 3),
      r('dc_volts', 40, 0.01, 0.8, 3),
      r('dc_volts', 400, 0.1, 0.8, 3),
      r('ac_volts', 4, 0.001, 1.2, 5),
      r('ac_volts', 40, 0.01, 1.2, 5),
      r('ac_volts', 400, 0.1, 1.2, 5),
      r('ohms', 400, 0.1, 1.0, 5),
      r('ohms', 4_000, 1, 1.0, 5),
      r('ohms', 40_000, 10, 1.0, 5),
      r('ohms', 400_000, 100, 1.0, 5),
      r('ohms', 4_000_000, 1_000, 1.0, 5),
      r('ohms', 40_000_000, 10_000, 2.0, 5),
      r('continuity', 400, 0.1, 1.0, 5),
      r('diode', 2, 0.001, 1.5, 5),
      r('dc_amps', 0.04, 0.00001, 1.5, 5),
      r('dc_amps', 0.4, 0.0001, 1.5, 5),
      r('dc_amps', 10, 0.01, 2.0, 5),
    ],
  },
  {
    key: 'clamp',
    name: 'DC clamp meter',
    model: 'Brindle CL-4 (4000 counts, DC/AC clamp)',
    ranges: [
      r('dc_amps', 40, 0.01, 2.5, 8),
      r('dc_amps', 400, 0.1, 2.8, 8),
      r('ac_amps', 40, 0.01, 2.5, 8),
      r('ac_amps', 400, 0.1, 2.8, 8),
      r('dc_volts', 4, 0.001, 1.0, 5),
      r('dc_volts', 40, 0.01, 1.0, 5),
      r('dc_volts', 400, 0.1, 1.0, 5),
      r('ac_volts', 400, 0.1, 1.5, 5),
      r('ohms', 400, 0.1, 1.0, 5),
      r('ohms', 4_000, 1, 1.0, 5),
      r('continuity', 400, 0.1, 1.0, 5),
    ],
  },
];
