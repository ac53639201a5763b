import * as yup from 'yup';

/** Request schemas of replays and practice, shared with the client's forms. */

export const COMMENT_MAX = 2000;

export const stepCommentSchema = yup.object({
  body: yup
    .string()
    .trim()
    .max(COMMENT_MAX, `A comment has at most ${COMMENT_MAX} characters.`)
    .required('Write the comment first.'),
});
export type StepCommentInput = yup.InferType<typeof stepCommentSchema>;

/** What a practice question asks: the verdict of the shown reading, or the check that comes next. */
export const PRACTICE_ASKS = ['verdict', 'next_check'] as const;
export type PracticeAsk = (typeof PRACTICE_ASKS)[number];

export const practiceAttemptSchema = yup.object({
  /** One pass through a replay in practice mode; the client makes it up when the pass starts. */
  runId: yup.string().uuid('runId is a UUID.').required('Send the runId of this practice pass.'),
  diagnosisId: yup.string().uuid('Pick a replay.').required('Say which replay this answer is for.'),
  stepSeq: yup.number().typeError('stepSeq is a step number.').integer('stepSeq is a whole number.').min(1).required('Say which step this answer is for.'),
  asked: yup.string().oneOf(PRACTICE_ASKS, 'asked is verdict or next_check.').required('Say what was asked.'),
  /** A verdict key or a check id, one of the question's choices. */
  answer: yup.string().trim().max(80, 'An answer has at most 80 characters.').required('Pick an answer.'),
});
export type PracticeAttemptInput = yup.InferType<typeof practiceAttemptSchema>;
