import * as yup from 'yup';

/** Request schemas of the diagnosis API, shared with the phone's forms. */

const text = (label: string, max: number) => yup.string().trim().max(max, `${label} has at most ${max} characters.`);

export const AMBIENT_MIN_C = -30;
export const AMBIENT_MAX_C = 60;

export const startDiagnosisSchema = yup.object({
  procedureId: yup.string().uuid('Pick a procedure.').required('Pick a procedure.'),
  /** Published version to run; the newest published one when absent. */
  versionNumber: yup.number().typeError('versionNumber is a number.').integer().min(1),
  jobId: yup.string().uuid('Pick a job.').required('Pick or create the job.'),
  meterId: yup.string().uuid('Pick the meter in your hand.').required('Pick the meter in your hand.'),
  ambientC: yup
    .number()
    .typeError('Ambient temperature is a number of °C, e.g. 21.')
    .min(AMBIENT_MIN_C, `Ambient temperature is at least ${AMBIENT_MIN_C} °C.`)
    .max(AMBIENT_MAX_C, `Ambient temperature is at most ${AMBIENT_MAX_C} °C.`)
    .required('Enter the ambient temperature in °C.'),
});
export type StartDiagnosisInput = yup.InferType<typeof startDiagnosisSchema>;

export const READING_MAX = 40;

export const submitStepSchema = yup.object({
  /** The check the reading is for; must be the diagnosis's current check. */
  checkId: yup.string().trim().max(80).required('Say which check this is for.'),
  /** What the meter shows, as typed. Required on measure checks. */
  reading: yup.string().max(READING_MAX, `A reading has at most ${READING_MAX} characters.`),
  /** The observation picked. Required on observe checks. */
  choiceId: yup.string().trim().max(80),
  note: text('A note', 2000).default(''),
});
export type SubmitStepInput = yup.InferType<typeof submitStepSchema>;

export const concludeSchema = yup.object({
  note: text('The closing note', 4000).default(''),
  parts: text('Parts', 1000).default(''),
  labourMinutes: yup.number().typeError('Labour is a number of minutes.').integer('Labour is whole minutes.').min(0).max(100_000).nullable().default(null),
});
export type ConcludeInput = yup.InferType<typeof concludeSchema>;

export const abandonSchema = yup.object({
  reason: text('The reason', 1000).required('Say why the diagnosis stops here.'),
});
export type AbandonInput = yup.InferType<typeof abandonSchema>;
