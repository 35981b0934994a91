import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import type { Request } from 'express';
import type { ObjectLiteral, SelectQueryBuilder } from 'typeorm';
import { ValidationFailed, type FieldProblem } from '../common/errors';
import { PageParam, PageSizeParam, UUID_RE } from '../common/fields';
import { parseDto } from '../common/validate';

/** The parameters every registry list takes: ?q=&sort=&order=&page=&pageSize=. Filters are per resource. */
export class ListQueryDto {
  @IsOptional() @IsString({ message: 'must be given once, as text' }) @MaxLength(100, { message: 'must be at most 100 characters' }) q?: string;
  @IsOptional() @IsString({ message: 'must be given once, as text' }) @MaxLength(40, { message: 'must be at most 40 characters' }) sort?: string;
  @IsOptional() @IsIn(['asc', 'desc'], { message: 'must be asc or desc' }) order?: 'asc' | 'desc';
  @PageParam page?: number;
  @PageSizeParam pageSize?: number;
}
const BASE_PARAMS = ['q', 'sort', 'order', 'page', 'pageSize'];

/** The values one filter accepts: a closed set, an id, or a code of a known form. */
export interface FilterRule {
  accepts: (value: string) => boolean;
  /** What the parameter must be, for the 400 ("must be one of NA, EU, ..."). */
  says: string;
}

export const oneOf = (values: readonly string[]): FilterRule => ({ accepts: (v) => values.includes(v), says: `must be one of ${values.join(', ')}` });
export const anId: FilterRule = { accepts: (v) => UUID_RE.test(v), says: 'must be an id' };
export const codeLike = (pattern: RegExp, says: string): FilterRule => ({ accepts: (v) => v.length <= 40 && pattern.test(v), says });

/** A list filter: the values it takes and the WHERE clause it adds. */
export interface ListFilter<E extends ObjectLiteral> {
  rule: FilterRule;
  apply: (qb: SelectQueryBuilder<E>, value: string) => void;
}

/** A list query checked against one resource: its sort keys and its filters, nothing else. */
export interface ListQuery extends ListQueryDto {
  /** Filter name to value, only those given (an empty value means no filter, as the client sends it). */
  filters: Map<string, string>;
}

/**
 * Checks the query string of a resource's list (and its CSV export): unknown parameters, unknown sort
 * keys and filter values outside their rule are refused with a 400 naming the parameter. The sort keys
 * and filters are Maps: a key from the request is never looked up in a plain object, where "__proto__"
 * or "constructor" would find Object.prototype's members.
 */
export async function parseListQuery(req: Request, sorts: ReadonlyMap<string, string>, filters: ReadonlyMap<string, FilterRule>): Promise<ListQuery> {
  const raw = req.query as Record<string, unknown>;
  const problems: FieldProblem[] = [];
  const base: Record<string, unknown> = {};
  const given = new Map<string, string>();
  for (const name of Object.keys(raw)) {
    const value = raw[name];
    if (BASE_PARAMS.includes(name)) base[name] = value;
    else if (!filters.has(name)) problems.push({ field: name, messages: [`is not a parameter of this list; it takes ${[...BASE_PARAMS, ...filters.keys()].join(', ')}`] });
    else if (typeof value !== 'string') problems.push({ field: name, messages: ['must be given once'] });
    else if (value !== '' && !filters.get(name)!.accepts(value)) problems.push({ field: name, messages: [filters.get(name)!.says] });
    else if (value !== '') given.set(name, value);
  }
  let dto = new ListQueryDto();
  try {
    dto = await parseDto(ListQueryDto, base, { source: 'query' });
  } catch (err) {
    if (!(err instanceof ValidationFailed)) throw err;
    problems.push(...(err.details as FieldProblem[]));
  }
  if (dto.sort !== undefined && !sorts.has(dto.sort)) problems.push({ field: 'sort', messages: [`must be one of ${[...sorts.keys()].join(', ')}`] });
  if (problems.length) throw new ValidationFailed(problems);
  return { ...dto, filters: given };
}
