import type { FormikHelpers } from 'formik';
import { ApiError } from '@/lib/api';

/**
 * Puts a failed submit on the form: field messages beside their inputs, the
 * server's sentence in the form's status (shown by FormError).
 */
export function showServerError<T>(error: unknown, { setErrors, setStatus }: Pick<FormikHelpers<T>, 'setErrors' | 'setStatus'>) {
  if (error instanceof ApiError) {
    if (error.fields) setErrors(error.fields as Parameters<typeof setErrors>[0]);
    setStatus(error.message);
  } else {
    setStatus('Something went wrong on this device. Reload the page and try again.');
  }
}
