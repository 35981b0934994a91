import type { ObjectLiteral } from 'typeorm';
import { REGIONS } from '../entities/registry';
import { codeLike, oneOf, type ListFilter } from './list-query';
import { KEY_CODE_PATTERN, KEY_CODE_SAYS, THREAD_CODE_PATTERN, THREAD_CODE_SAYS } from './registry.dto';

// Pieces every resource definition (server/registry/<resource>/) builds on.
export type Dto = Record<string, unknown>;
export const stamps = (e: { id: string; version: number; createdAt: Date; updatedAt: Date }) => ({ id: e.id, version: e.version, createdAt: e.createdAt, updatedAt: e.updatedAt });
// The rules of each filter value; a value outside its rule is a 400 naming the parameter, not an empty list.
export const region = oneOf(REGIONS);
export const threadCode = codeLike(THREAD_CODE_PATTERN, `must be a thread code (it ${THREAD_CODE_SAYS})`);
export const keyCode = codeLike(KEY_CODE_PATTERN, `must be a key code (it ${KEY_CODE_SAYS})`);
export const filter = <E extends ObjectLiteral>(rule: ListFilter<E>['rule'], apply: ListFilter<E>['apply']): ListFilter<E> => ({ rule, apply });
/** A filter on the code of a joined thread spec or key code. */
export const byCode = <E extends ObjectLiteral>(param: 'thread' | 'key', relation: string): ListFilter<E> =>
  filter(param === 'thread' ? threadCode : keyCode, (qb, value) => qb.andWhere(`${relation}.code = :${param}`, { [param]: value }));
