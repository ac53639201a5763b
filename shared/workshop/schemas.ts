import * as yup from 'yup';
import { METER_FUNCTIONS } from '../engine/quantity';

/** Yup schemas for the shop's machines, jobs and meters, shared by forms and the API. */

const text = (label: string, max: number) =>
  yup.string().trim().max(max, `${label} has at most ${max} characters.`);

export const MILEAGE_UNITS = ['km', 'mi'] as const;

export const machineSchema = yup.object({
  make: text('Make', 60).required('Enter the make.'),
  model: text('Model', 60).required('Enter the model.'),
  year: yup
    .number()
    .typeError('Year is a number such as 2019.')
    .integer('Year is a whole number.')
    .min(1900, 'Year is 1900 or later.')
    .max(2100, 'Year is 2100 or earlier.')
    .required('Enter the model year.'),
  engine: text('Engine', 80).default(''),
  vin: yup
    .string()
    .trim()
    .uppercase()
    .max(17, 'A VIN has at most 17 characters.')
    .matches(/^[A-Z0-9]*$/, 'A VIN has only letters and digits.')
    .default(''),
  mileage: yup.number().typeError('Mileage is a number.').integer('Mileage is a whole number.').min(0, 'Mileage cannot be negative.').max(10_000_000).nullable().default(null),
  mileageUnit: yup.string().oneOf([...MILEAGE_UNITS], 'Mileage is in km or mi.').default('km'),
});
export type MachineInput = yup.InferType<typeof machineSchema>;

export const jobSchema = yup.object({
  machineId: yup.string().uuid('Pick a machine.').required('Pick a machine.'),
  customerName: text('Customer name', 80).required("Enter the customer's name."),
  customerContact: text('Contact', 120).default(''),
  customerEmail: yup.string().trim().lowercase().max(254).email('Enter an e-mail address like name@example.com.').default(''),
  complaint: text('Complaint', 500).required("Enter the complaint in the customer's words."),
  reference: text('Work order', 40).default(''),
});
export type JobInput = yup.InferType<typeof jobSchema>;

export const meterRangeSchema = yup.object({
  function: yup.string().oneOf([...METER_FUNCTIONS], 'Pick a meter function.').required('Pick a meter function.'),
  /** Full scale of the range, in SI units (e.g. 600 for the 600.0 V range). */
  rangeMax: yup.number().typeError('Range is a number.').positive('Range must be above zero.').required('Enter the range.'),
  /** One count: the step of the last digit on this range, in SI units. */
  resolution: yup.number().typeError('Resolution is a number.').positive('Resolution must be above zero.').required('Enter the resolution.'),
  pctOfReading: yup.number().typeError('Accuracy is a number.').min(0, 'Accuracy cannot be negative.').max(50, 'Accuracy is a percentage below 50.').required('Enter the % of reading.'),
  counts: yup.number().typeError('Counts is a number.').integer('Counts is a whole number.').min(0, 'Counts cannot be negative.').max(1000).required('Enter the counts.'),
});

export const meterSchema = yup.object({
  name: text('Name', 60).required('Name the meter, e.g. "Bench meter 2".'),
  model: text('Model', 80).default(''),
  ranges: yup.array(meterRangeSchema.required()).min(1, 'Add at least one range with its accuracy.').max(80, 'At most 80 ranges.').required(),
});
export type MeterInput = yup.InferType<typeof meterSchema>;
export type MeterRange = yup.InferType<typeof meterRangeSchema>;
