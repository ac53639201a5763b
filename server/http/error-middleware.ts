import type { ErrorRequestHandler, RequestHandler } from 'express';
import * as yup from 'yup';
import { ApiError } from './api-error';

export const apiNotFound: RequestHandler = (req) => {
  throw new ApiError(404, 'not_found', `There is no API endpoint ${req.method} ${req.originalUrl.split("?")[0]}.`);
};

interface BodyParserError {
  type?: string;
  status?: number;
}

export const errorMiddleware: ErrorRequestHandler = (err, req, res, _next) => {
  const body = toErrorBody(err);
  if (body.status >= 500) req.log?.error({ err }, 'request failed');
  res.status(body.status).json({ error: body.error });
};

interface ErrorBody {
  status: number;
  error: { code: string; message: string; fields?: Record<string, string>; [more: string]: unknown };
}

function toErrorBody(err: unknown): ErrorBody {
  if (err instanceof ApiError) {
    return { status: err.status, error: { ...err.details, code: err.code, message: err.message, ...(err.fields ? { fields: err.fields } : {}) } };
  }
  if (err instanceof yup.ValidationError) {
    return { status: 400, error: { code: 'invalid_input', message: err.errors.join(' '), fields: fieldsOf(err) } };
  }
  const parser = err as BodyParserError;
  if (parser?.type === 'entity.parse.failed') {
    return { status: 400, error: { code: 'malformed_json', message: 'The request body is not valid JSON.' } };
  }
  if (parser?.type === 'entity.too.large') {
    return { status: 413, error: { code: 'too_large', message: 'The request body is too large.' } };
  }
  if (parser?.type === 'encoding.unsupported' || parser?.type === 'charset.unsupported') {
    return { status: 415, error: { code: 'unsupported_encoding', message: 'Send the body as UTF-8 JSON.' } };
  }
  if (typeof parser?.status === 'number' && parser.status >= 400 && parser.status < 500) {
    return { status: parser.status, error: { code: 'bad_request', message: 'The request could not be read.' } };
  }
  return { status: 500, error: { code: 'internal', message: 'Something went wrong on the server. Nothing was changed; try again.' } };
}

export function fieldsOf(err: yup.ValidationError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const inner of err.inner.length ? err.inner : [err]) {
    const key = inner.path || '_';
    if (!fields[key]) fields[key] = inner.message;
  }
  return fields;
}
