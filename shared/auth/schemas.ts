import * as yup from 'yup';
import { ROLES } from './roles';

/** Yup schemas shared by the client forms and the server's validate() middleware. */

const email = yup
  .string()
  .trim()
  .lowercase()
  .max(254, 'An e-mail address has at most 254 characters.')
  .email('Enter an e-mail address like name@example.com.')
  .required('Enter your e-mail address.');

export const PASSWORD_MIN = 10;
const newPassword = yup
  .string()
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
  .max(200, 'Use at most 200 characters.')
  .required('Choose a password.');

const personName = yup
  .string()
  .trim()
  .min(1, 'Enter a name.')
  .max(80, 'A name has at most 80 characters.')
  .required('Enter a name.');

const token = yup.string().trim().max(200, 'That link is not valid.').required('The link is missing its token.');

export const signInSchema = yup.object({
  email,
  password: yup.string().max(200, 'Use at most 200 characters.').required('Enter your password.'),
});
export type SignInInput = yup.InferType<typeof signInSchema>;

export const forgotPasswordSchema = yup.object({ email });
export type ForgotPasswordInput = yup.InferType<typeof forgotPasswordSchema>;

export const resetPasswordSchema = yup.object({ token, password: newPassword });
export type ResetPasswordInput = yup.InferType<typeof resetPasswordSchema>;

export const createInviteSchema = yup.object({
  email,
  role: yup.string().oneOf([...ROLES], 'Pick one of: owner, lead, tech, apprentice.').required('Pick a role.'),
});
export type CreateInviteInput = yup.InferType<typeof createInviteSchema>;

export const acceptInviteSchema = yup.object({ token, name: personName, password: newPassword });
export type AcceptInviteInput = yup.InferType<typeof acceptInviteSchema>;

export const updateMemberSchema = yup
  .object({
    role: yup.string().oneOf([...ROLES], 'Pick one of: owner, lead, tech, apprentice.'),
    active: yup.boolean().strict(),
  })
  .test('something-to-change', 'Send a role or an active flag to change.', (v) => v.role !== undefined || v.active !== undefined);
export type UpdateMemberInput = yup.InferType<typeof updateMemberSchema>;
