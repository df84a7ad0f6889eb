/**
 * An error a route means to answer with: its status, a stable code the client can branch on and a
 * message a person can act on. `expected` errors are ordinary outcomes (wrong password, stale save)
 * and are not logged as faults.
 */
export class AppError extends Error {
  readonly status: number;
  readonly code: string;
  readonly expected: boolean;
  readonly fields?: Record<string, string>;
  /** Extra members of the error body, e.g. `latestRevision` on a stale save. */
  readonly details?: Record<string, unknown>;

  constructor(
    status: number,
    code: string,
    message: string,
    options: { expected?: boolean; fields?: Record<string, string>; details?: Record<string, unknown> } = {},
  ) {
    super(message);
    this.name = 'AppError';
    this.status = status;
    this.code = code;
    this.expected = options.expected ?? status < 500;
    this.fields = options.fields;
    this.details = options.details;
  }
}

export const notFound = (what: string) => new AppError(404, 'not_found', `${what} was not found. It may have been deleted.`);
