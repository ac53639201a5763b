import * as yup from 'yup';

/** Request schemas of the procedure API (the document itself is checked by the engine's procedure schema). */

const text = (label: string, max: number) => yup.string().trim().max(max, `${label} has at most ${max} characters.`);

export const createProcedureSchema = yup.object({
  title: text('Title', 120).required('Give the procedure a title.'),
  complaint: text('Complaint', 200).required('Say which complaint it diagnoses, e.g. "cranks but no spark".'),
  family: text('Machine family', 200).required('Say which machines it applies to.'),
});
export type CreateProcedureInput = yup.InferType<typeof createProcedureSchema>;

const revision = yup
  .number()
  .typeError('revision is the number of the draft you edited.')
  .integer()
  .min(1)
  .required('Send the revision of the draft you edited.');

export const saveDraftSchema = yup.object({
  revision,
  document: yup.mixed().required('Send the procedure document.'),
});

/** A new procedure from this one: with `document`, an editor's unsaved work (after a conflicting save); without, a duplicate of the latest. */
export const copyDraftSchema = yup.object({ document: yup.mixed().optional() });

export const publishDraftSchema = yup.object({
  revision,
  /** The editor asks for it; older API clients may leave it out. */
  note: text('Change note', 1000).default(''),
});
export type PublishDraftInput = yup.InferType<typeof publishDraftSchema>;

export const newDraftSchema = yup.object({
  fromVersion: yup.number().typeError('fromVersion is a version number.').integer().min(1).required('Say which published version to start from.'),
});
