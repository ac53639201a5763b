import type { When } from './time';

/**
 * Demo content: the invented demo shop's machines and work orders. Makes, models, VINs and customers are made
 * up. Each 17-character VIN carries the correct North American check digit in position 9 (computed with
 * `vinCheckDigit`); the mower, like most small engines, has none.
 */

export type DemoJobKey = 'tessa-no-start' | 'fellrunner-flat' | 'marra-drain' | 'wren-no-crank' | 'fellrunner-headlight' | 'wren-drain' | 'mower-no-start';

export interface DemoMachine {
  make: string;
  model: string;
  year: number;
  engine: string;
  vin: string;
  mileage: number | null;
  mileageUnit: 'km' | 'mi';
}

export interface DemoJob {
  /** A hand-written story's job, or a generated one. */
  key: DemoJobKey | `generated-${number}`;
  machine: DemoMachine;
  customerName: string;
  customerContact: string;
  customerEmail: string;
  /** In the customer's own words. */
  complaint: string;
  reference: string;
  booked: When;
}

export const DEMO_JOBS: readonly DemoJob[] = [
  {
    key: 'tessa-no-start',
    machine: { make: 'Veltro', model: 'Tessa 650', year: 2016, engine: '649 cc parallel twin, CDI', vin: '7VLTS65A2GK102871', mileage: 38_410, mileageUnit: 'km' },
    customerName: 'Gethin Marlowe',
    customerContact: '07700 900418',
    customerEmail: 'gethin.marlowe@example.com',
    complaint: 'Died at the lights on the way home and won’t restart. Turns over fine, just doesn’t fire.',
    reference: 'WO-2318',
    booked: { daysAgo: 16, hour: 8, minute: 40 },
  },
  {
    key: 'fellrunner-flat',
    machine: { make: 'Nordane', model: 'Fellrunner 570', year: 2019, engine: '567 cc single, 3-phase charging', vin: '5NDF57XA0KN200934', mileage: 6_120, mileageUnit: 'km' },
    customerName: 'Bram Visser',
    customerContact: '07700 900257',
    customerEmail: 'bram@vissersfarm.example',
    complaint: 'Battery keeps going flat. Had to jump it three times this month and the battery is only new in spring.',
    reference: 'WO-2334',
    booked: { daysAgo: 9, hour: 14, minute: 50 },
  },
  {
    key: 'marra-drain',
    machine: { make: 'Veltro', model: 'Marra 650', year: 2018, engine: '649 cc parallel twin, fuel injected', vin: '7VLMR65A2JK108452', mileage: 21_975, mileageUnit: 'km' },
    customerName: 'Lucía Fenwick',
    customerContact: '07700 900633',
    customerEmail: 'lucia.fenwick@example.com',
    complaint: 'If it sits for a week the battery is dead. Fine when I ride it every day.',
    reference: 'WO-2341',
    booked: { daysAgo: 4, hour: 9, minute: 30 },
  },
  {
    key: 'wren-no-crank',
    machine: { make: 'Pippit', model: 'Wren 150', year: 2021, engine: '149 cc single, CVT', vin: '3PPW15SC6MC300418', mileage: 9_840, mileageUnit: 'km' },
    customerName: 'Ade Kowalczyk',
    customerContact: '07700 900781',
    customerEmail: 'ade.k@example.com',
    complaint: 'Press the button and nothing happens. Lights and horn work. Kick start still gets it going.',
    reference: 'WO-2352',
    booked: { minutesAgo: 75 },
  },
  {
    key: 'fellrunner-headlight',
    machine: { make: 'Nordane', model: 'Fellrunner 450', year: 2017, engine: '449 cc single', vin: '5NDF45XA1HN201266', mileage: 11_300, mileageUnit: 'km' },
    customerName: 'Harriet Quayle',
    customerContact: '07700 900129',
    customerEmail: 'hq@quaylestables.example',
    complaint: 'Headlight stopped working after I pressure-washed it. High beam still comes on.',
    reference: 'WO-2349',
    booked: { daysAgo: 1, hour: 16, minute: 10 },
  },
  {
    key: 'wren-drain',
    machine: { make: 'Pippit', model: 'Wren 125', year: 2020, engine: '124 cc single, CVT', vin: '3PPW12SC4LC301077', mileage: 14_205, mileageUnit: 'km' },
    customerName: 'Noor Castellane',
    customerContact: '07700 900564',
    customerEmail: 'noor.castellane@example.com',
    complaint: 'Flat battery every morning if I leave it two days. Since the phone charger was fitted.',
    reference: 'WO-2350',
    booked: { daysAgo: 1, hour: 11, minute: 25 },
  },
  {
    key: 'mower-no-start',
    machine: { make: 'Tallow Creek', model: 'TC-420 ride-on mower', year: 2015, engine: '420 cc single, flywheel magneto', vin: '', mileage: null, mileageUnit: 'km' },
    customerName: 'Oswin Penhaligon',
    customerContact: '07700 900902',
    customerEmail: '',
    complaint: 'Won’t start after the winter. Turns over on the key but not a cough.',
    reference: 'WO-2353',
    booked: { minutesAgo: 30 },
  },
];
