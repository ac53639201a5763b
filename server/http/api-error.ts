/** The one error type handlers throw; the error middleware turns it into `{ error: { code, message, fields? } }`. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    /** More that a client can act on, e.g. the problem list of a procedure that cannot be published. */
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export const notFound = (what: string) => new ApiError(404, 'not_found', `No ${what} with that id in your shop.`);
