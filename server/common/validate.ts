import { plainToInstance, type ClassConstructor } from 'class-transformer';
import { validate, type ValidationError } from 'class-validator';
import type { Request, RequestHandler } from 'express';
import { ValidationFailed, type FieldProblem } from './errors';

/** Where the values came from: the body has fields, the query string has parameters. */
type Source = 'body' | 'query';

const unknownName = (source: Source) => (source === 'query' ? 'is not a parameter this request takes' : 'is not a field this request takes');

function flatten(errors: ValidationError[], source: Source, prefix = ''): FieldProblem[] {
  return errors.flatMap((e) => {
    const field = prefix ? `${prefix}.${e.property}` : e.property;
    // class-validator's own words for an unknown key ("property x should not exist") name no fix.
    const messages = e.constraints ? Object.entries(e.constraints).map(([rule, message]) => (rule === 'whitelistValidation' ? unknownName(source) : message)) : [];
    const own = messages.length ? [{ field, messages }] : [];
    return [...own, ...flatten(e.children ?? [], source, field)];
  });
}

/** Turns a plain object into a validated DTO instance or throws a 400 naming each bad field. */
export async function parseDto<T extends object>(cls: ClassConstructor<T>, plain: unknown, options: { partial?: boolean; source?: Source } = {}): Promise<T> {
  if (plain === null || typeof plain !== 'object' || Array.isArray(plain)) {
    throw new ValidationFailed([{ field: 'body', messages: ['must be a JSON object'] }]);
  }
  const instance = plainToInstance(cls, plain, { enableImplicitConversion: false });
  // A partial update validates only the fields it carries; a field carried as null is validated (and
  // refused where null means nothing), where skipMissingProperties would let it reach a NOT NULL column.
  const errors = await validate(instance, { whitelist: true, forbidNonWhitelisted: true, forbidUnknownValues: true, skipUndefinedProperties: !!options.partial });
  if (errors.length) throw new ValidationFailed(flatten(errors, options.source ?? 'body'));
  return instance;
}

/** The query string of a request as a validated DTO; a parameter the DTO does not name is refused. */
export function parseQuery<T extends object>(cls: ClassConstructor<T>, req: Request): Promise<T> {
  return parseDto(cls, { ...(req.query as object) }, { source: 'query' });
}

/** For lists that read their few parameters themselves: refuses any other, so a misspelt filter is not silently ignored. */
export function refuseQuery(req: Request, allowed: readonly string[] = []): void {
  const names = Object.keys(req.query as object).filter((name) => !allowed.includes(name));
  if (names.length) throw new ValidationFailed(names.map((field) => ({ field, messages: [unknownName('query')] })));
}

/** Express middleware: validates req.body against a DTO class and replaces it with the instance. */
export function body<T extends object>(cls: ClassConstructor<T>, options: { partial?: boolean } = {}): RequestHandler {
  return async (req, _res, next) => {
    req.body = await parseDto(cls, req.body ?? {}, options);
    next();
  };
}
