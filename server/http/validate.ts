import type { RequestHandler } from 'express';
import * as yup from 'yup';
import { ApiError } from './api-error';
import { fieldsOf } from './error-middleware';

/**
 * Runs the same yup schema the client form uses. Unknown top-level fields are
 * refused rather than dropped, so a body cannot smuggle e.g. a shopId.
 */
export function validateBody(schema: yup.AnyObjectSchema): RequestHandler {
  const known = new Set(Object.keys(schema.fields));
  return async (req, _res, next) => {
    const body: unknown = req.body;
    if (body === undefined || body === null || typeof body !== 'object' || Array.isArray(body)) {
      throw new ApiError(400, 'invalid_input', 'Send a JSON object as the request body.');
    }
    const unknown = Object.keys(body).filter((k) => !known.has(k));
    if (unknown.length) {
      throw new ApiError(
        400,
        'unknown_field',
        `Unknown field${unknown.length > 1 ? 's' : ''}: ${unknown.slice(0, 5).join(', ')}.`,
        Object.fromEntries(unknown.slice(0, 20).map((k) => [k, 'This field is not accepted here.'])),
      );
    }
    try {
      req.body = await schema.validate(body, { abortEarly: false, stripUnknown: false });
    } catch (err) {
      if (err instanceof yup.ValidationError) {
        throw new ApiError(400, 'invalid_input', err.errors.join(' '), fieldsOf(err));
      }
      throw err;
    }
    next();
  };
}
