import { plainToInstance, type ClassConstructor } from 'class-transformer';
import { validate, type ValidationError } from 'class-validator';
import type { RequestHandler } from 'express';
import { ValidationFailed, type FieldProblem } from './errors';

function flatten(errors: ValidationError[], prefix = ''): FieldProblem[] {
  return errors.flatMap((e) => {
    const field = prefix ? `${prefix}.${e.property}` : e.property;
    const own = e.constraints ? [{ field, messages: Object.values(e.constraints) }] : [];
    return [...own, ...flatten(e.children ?? [], field)];
  });
}

/** Turns a plain object into a validated DTO instance or throws a 400 naming each bad field. */
export async function parseDto<T extends object>(cls: ClassConstructor<T>, plain: unknown, options: { partial?: boolean } = {}): Promise<T> {
  if (plain === null || typeof plain !== 'object' || Array.isArray(plain)) {
    throw new ValidationFailed([{ field: 'body', messages: ['must be a JSON object'] }]);
  }
  const instance = plainToInstance(cls, plain, { enableImplicitConversion: false });
  // A partial update validates only the fields it carries.
  const errors = await validate(instance, { whitelist: true, forbidNonWhitelisted: true, forbidUnknownValues: true, skipMissingProperties: !!options.partial });
  if (errors.length) throw new ValidationFailed(flatten(errors));
  return instance;
}

/** Express middleware: validates req.body against a DTO class and replaces it with the instance. */
export function body<T extends object>(cls: ClassConstructor<T>, options: { partial?: boolean } = {}): RequestHandler {
  return async (req, _res, next) => {
    req.body = await parseDto(cls, req.body ?? {}, options);
    next();
  };
}
