/** What a check measures. The quantity decides the unit, the sign rules and what "OL" means. */
export const QUANTITIES = [
  'resistance',
  'continuity',
  'diode',
  'voltage_dc',
  'voltage_ac',
  'current_dc',
  'current_ac',
  'frequency',
  'temperature',
] as const;
export type Quantity = (typeof QUANTITIES)[number];

export type Dimension = 'resistance' | 'voltage' | 'current' | 'frequency' | 'temperature';

/** SI base symbol a spec's numbers are stored in. */
export type UnitSymbol = 'Ω' | 'V' | 'A' | 'Hz' | '°C';

/** The meter dial position a check asks for. */
export const METER_FUNCTIONS = [
  'ohms',
  'continuity',
  'diode',
  'dc_volts',
  'ac_volts',
  'dc_amps',
  'ac_amps',
  'frequency',
  'temperature',
] as const;
export type MeterFunction = (typeof METER_FUNCTIONS)[number];

export interface QuantityInfo {
  readonly dimension: Dimension;
  readonly symbol: UnitSymbol;
  /** Plain words for messages: "this check reads …". */
  readonly noun: string;
  /** Whether a reading may carry a minus sign (DC polarity); a negative resistance is a wiring or zeroing mistake. */
  readonly signed: boolean;
  /** On resistance and diode ranges "OL" is an open circuit; elsewhere it only means "above this range". */
  readonly opensOnOverRange: boolean;
  /** Which AC/DC designator fits; null where AC/DC means nothing. */
  readonly acdc: 'ac' | 'dc' | null;
  /**
   * Powers of ten a technician may type as a prefix, ascending. Limited to what a shop meter shows so that a
   * slip of case ("85 MA" for milliamps) is refused instead of read as 85 megaamperes.
   */
  readonly prefixExponents: readonly number[];
  readonly meterFunctions: readonly MeterFunction[];
  /** Example readings used in messages telling the technician what to type. */
  readonly example: string;
}

export const QUANTITY_INFO: Readonly<Record<Quantity, QuantityInfo>> = {
  resistance: {
    dimension: 'resistance',
    symbol: 'Ω',
    noun: 'resistance',
    signed: false,
    opensOnOverRange: true,
    acdc: null,
    prefixExponents: [-3, 0, 3, 6, 9],
    meterFunctions: ['ohms'],
    example: '480 Ω, 0.48 kΩ or OL',
  },
  continuity: {
    dimension: 'resistance',
    symbol: 'Ω',
    noun: 'continuity (resistance)',
    signed: false,
    opensOnOverRange: true,
    acdc: null,
    prefixExponents: [-3, 0, 3, 6],
    meterFunctions: ['continuity', 'ohms'],
    example: '0.3 Ω or OL',
  },
  diode: {
    dimension: 'voltage',
    symbol: 'V',
    noun: 'diode-test voltage',
    signed: false,
    opensOnOverRange: true,
    acdc: 'dc',
    prefixExponents: [-3, 0],
    meterFunctions: ['diode'],
    example: '0.55 V, 550 mV or OL',
  },
  voltage_dc: {
    dimension: 'voltage',
    symbol: 'V',
    noun: 'DC volts',
    signed: true,
    opensOnOverRange: false,
    acdc: 'dc',
    prefixExponents: [-6, -3, 0, 3],
    meterFunctions: ['dc_volts'],
    example: '12.6 V or 180 mV',
  },
  voltage_ac: {
    dimension: 'voltage',
    symbol: 'V',
    noun: 'AC volts',
    signed: true,
    opensOnOverRange: false,
    acdc: 'ac',
    prefixExponents: [-6, -3, 0, 3],
    meterFunctions: ['ac_volts'],
    example: '4.2 V or 650 mV',
  },
  current_dc: {
    dimension: 'current',
    symbol: 'A',
    noun: 'DC amps',
    signed: true,
    opensOnOverRange: false,
    acdc: 'dc',
    prefixExponents: [-9, -6, -3, 0],
    meterFunctions: ['dc_amps'],
    example: '25 mA or 1.2 A',
  },
  current_ac: {
    dimension: 'current',
    symbol: 'A',
    noun: 'AC amps',
    signed: true,
    opensOnOverRange: false,
    acdc: 'ac',
    prefixExponents: [-9, -6, -3, 0],
    meterFunctions: ['ac_amps'],
    example: '25 mA or 1.2 A',
  },
  frequency: {
    dimension: 'frequency',
    symbol: 'Hz',
    noun: 'frequency',
    signed: false,
    opensOnOverRange: false,
    acdc: null,
    prefixExponents: [0, 3, 6],
    meterFunctions: ['frequency'],
    example: '60 Hz or 1.2 kHz',
  },
  temperature: {
    dimension: 'temperature',
    symbol: '°C',
    noun: 'temperature',
    signed: true,
    opensOnOverRange: false,
    acdc: null,
    prefixExponents: [0],
    meterFunctions: ['temperature'],
    example: '32 °C',
  },
};
