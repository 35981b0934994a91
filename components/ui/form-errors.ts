import { ApiError } from '../api/client';

/** Messages by field path, in the API's own paths: `lengthMm`, `openings.1.threadCode`. */
export type FieldErrors = Record<string, string>;

/** A server answer read for a form: messages for the fields it has, the rest for the form as a whole. */
export interface FormProblem {
  fields: FieldErrors;
  /** Said above the buttons: the server's message, or the problems with fields the form does not show. */
  form: string | null;
  /** On a 409 after an update: the record as someone else saved it. */
  current: unknown | null;
}

/** "Length" + "must be more than 0 mm" → "Length must be more than 0 mm." */
export function sentence(label: string, message: string): string {
  const text = `${label} ${message}`.trim();
  return /[.!?]$/.test(text) ? text : `${text}.`;
}

/**
 * Maps an error from a save to the form. `labelOf` names a field path the form shows (undefined when the form
 * does not show it); the server's details name fields by path, e.g. `openings.1.threadCode`.
 */
export function formProblemOf(err: unknown, labelOf: (path: string) => string | undefined): FormProblem {
  if (!(err instanceof ApiError)) {
    return { fields: {}, form: err instanceof Error ? err.message : 'Something went wrong; try again.', current: null };
  }
  const details = err.details as { current?: unknown } | null;
  if (err.status === 409 && details && !Array.isArray(details) && details.current) {
    return { fields: {}, form: err.message, current: details.current };
  }
  const fields: FieldErrors = {};
  const elsewhere: string[] = [];
  for (const [path, message] of Object.entries(err.fieldMessages())) {
    const label = labelOf(path);
    if (label) fields[path] = sentence(label, message);
    else elsewhere.push(sentence(path, message));
  }
  const form = Object.keys(fields).length && !elsewhere.length ? 'The server did not accept some fields; see the messages beside them.' : elsewhere.length ? elsewhere.join(' ') : err.message;
  return { fields, form, current: null };
}
