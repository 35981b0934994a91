/** One typed error family: services throw these, the error middleware turns them into JSON. */
export interface FieldProblem {
  field: string;
  messages: string[];
}

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details: unknown = null,
  ) {
    super(message);
  }
}

export class ValidationFailed extends HttpError {
  constructor(problems: FieldProblem[]) {
    const summary = problems.map((p) => `${p.field}: ${p.messages.join('; ')}`).join(' | ');
    super(400, 'validation_failed', `Check these fields: ${summary}`, problems);
  }
}

export const badRequest = (code: string, message: string, details: unknown = null) => new HttpError(400, code, message, details);
export const unauthorized = (message = 'Sign in to continue.') => new HttpError(401, 'unauthorized', message);
export const forbidden = (message = 'Your role does not allow this.') => new HttpError(403, 'forbidden', message);
export const notFound = (what: string) => new HttpError(404, 'not_found', `${what} was not found.`);
export const conflict = (message: string, details: unknown = null) => new HttpError(409, 'conflict', message, details);
export const unavailable = (message = 'The database is unavailable; try again shortly.') => new HttpError(503, 'unavailable', message);

/** A field-level 400 for one field, for checks that class-validator cannot express (unknown codes, etc.). */
export const fieldError = (field: string, message: string) => new ValidationFailed([{ field, messages: [message] }]);
