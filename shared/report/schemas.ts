import * as yup from 'yup';

/** E-mailing a concluded diagnosis's report; without `to` it goes to the job's customer e-mail. */
export const emailReportSchema = yup.object({
  to: yup.string().trim().lowercase().max(254, 'An e-mail address has at most 254 characters.').email('Enter an e-mail address like name@example.com.'),
});
export type EmailReportInput = yup.InferType<typeof emailReportSchema>;
