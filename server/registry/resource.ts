import { secured } from '../auth/policy';
import { Router, type Request } from 'express';
import type { ClassConstructor } from 'class-transformer';
import type { DataSource, EntityManager, EntityTarget, ObjectLiteral, SelectQueryBuilder } from 'typeorm';
import { audit } from '../audit/audit';
import { conflict, fieldError, notFound } from '../common/errors';
import { translateDbError } from '../common/db-errors';
import { UUID_RE } from '../common/fields';
import { parseDto } from '../common/validate';
import { parseListQuery, type FilterRule, type ListFilter, type ListQuery } from './list-query';

/** Versions are PostgreSQL integers. */
export const MAX_VERSION = 2_147_483_647;

export type { Page } from '../../shared/contract/records';
import type { Page } from '../../shared/contract/records';

export interface WriteContext {
  manager: EntityManager;
  user: Express.User;
  /** The record before the change, on update. */
  existing?: ObjectLiteral;
}

/**
 * One registry resource: how it is listed, searched, shown and written. The generic router below gives
 * every resource the same list/detail/create/update/delete behaviour, paging in SQL and optimistic locking.
 */
export interface ResourceDef<E extends ObjectLiteral> {
  path: string;
  label: string;
  entity: EntityTarget<E>;
  alias: string;
  dto: ClassConstructor<object>;
  /** Adds the joins a list row and a detail need. */
  joins: (qb: SelectQueryBuilder<E>) => SelectQueryBuilder<E>;
  /** SQL expressions matched by ?q= (case-insensitive, substring). */
  search: string[];
  /** Sort keys to entity property paths (alias.property: TypeORM pages joined queries by these). Read into a Map. */
  sorts: Record<string, string>;
  defaultSort: string;
  /** Filters by query parameter name: the values each takes and the WHERE clause it adds. Read into a Map. */
  filters?: Record<string, ListFilter<E>>;
  toJson: (e: E) => object;
  /** Turns a validated DTO into column values (codes to ids, defaults); may throw field errors. */
  toColumns: (dto: Record<string, unknown>, ctx: WriteContext) => Promise<Partial<E>>;
  /** Writes child rows (drum openings) after the record itself. */
  afterWrite?: (record: E, dto: Record<string, unknown>, ctx: WriteContext) => Promise<void>;
  /** Extra fields on the detail answer (relations to other records). */
  detailExtras?: (record: E, manager: EntityManager) => Promise<object>;
}

export function parseId(raw: unknown): string {
  const id = String(raw);
  if (!UUID_RE.test(id)) throw fieldError('id', 'must be an id');
  return id;
}

export class ResourceService<E extends ObjectLiteral> {
  // Maps, never the definition's plain objects: the keys come from the request.
  private readonly sorts: ReadonlyMap<string, string>;
  private readonly filters: ReadonlyMap<string, ListFilter<E>>;
  private readonly filterRules: ReadonlyMap<string, FilterRule>;

  constructor(
    readonly ds: DataSource,
    readonly def: ResourceDef<E>,
  ) {
    this.sorts = new Map(Object.entries(def.sorts));
    this.filters = new Map(Object.entries(def.filters ?? {}));
    this.filterRules = new Map([...this.filters].map(([name, f]) => [name, f.rule]));
    if (!this.sorts.has(def.defaultSort)) throw new Error(`${def.path}: the default sort ${def.defaultSort} is not one of its sorts`);
  }

  /** The list's query string, checked against this resource's sorts and filters (400 naming the parameter). */
  parseQuery(req: Request): Promise<ListQuery> {
    return parseListQuery(req, this.sorts, this.filterRules);
  }

  private base(manager: EntityManager = this.ds.manager): SelectQueryBuilder<E> {
    return this.def.joins(manager.getRepository(this.def.entity).createQueryBuilder(this.def.alias));
  }

  async list(query: ListQuery): Promise<Page<object>> {
    const { def } = this;
    const page = query.page ?? 1;
    const pageSize = query.pageSize ?? 25;
    const sortExpr = this.sorts.get(query.sort ?? def.defaultSort);
    if (!sortExpr) throw fieldError('sort', `must be one of ${[...this.sorts.keys()].join(', ')}`);
    const qb = this.base();
    if (query.q?.trim()) {
      const q = `%${query.q.trim().replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      qb.andWhere(`(${def.search.map((expr) => `${expr} ILIKE :q`).join(' OR ')})`, { q });
    }
    for (const [name, value] of query.filters) this.filters.get(name)?.apply(qb, value);
    qb.orderBy(sortExpr, query.order === 'desc' ? 'DESC' : 'ASC').addOrderBy(`${def.alias}.id`, 'ASC');
    const [rows, total] = this.joinsOneRowEach(qb)
      ? await this.pageWithCount(qb, page, pageSize)
      : await qb
          .skip((page - 1) * pageSize)
          .take(pageSize)
          .getManyAndCount();
    return { items: rows.map(def.toJson), total, page, pageSize };
  }

  /** Whether every join adds at most one row per record (many-to-one), so that LIMIT pages records, not joined rows. */
  private joinsOneRowEach(qb: SelectQueryBuilder<E>): boolean {
    return qb.expressionMap.joinAttributes.every((j) => !j.isMany);
  }

  /**
   * One page and the total in one statement: the total as a window count over the matching rows, computed
   * before LIMIT. TypeORM's skip/take with joins costs three round trips (the page's ids, its rows, a
   * COUNT(DISTINCT)), most of a search's time at the registry's size. A page past the end has no row to carry
   * the total, so only then is it counted on its own.
   */
  private async pageWithCount(qb: SelectQueryBuilder<E>, page: number, pageSize: number): Promise<[E[], number]> {
    const { entities, raw } = await qb
      .addSelect('COUNT(*) OVER ()', 'page_total')
      .offset((page - 1) * pageSize)
      .limit(pageSize)
      .getRawAndEntities<{ page_total: string }>();
    if (raw.length) return [entities, Number(raw[0].page_total)];
    return [entities, page === 1 ? 0 : await qb.getCount()];
  }

  async findEntity(id: string, manager: EntityManager = this.ds.manager): Promise<E> {
    const record = await this.base(manager).where(`${this.def.alias}.id = :id`, { id }).getOne();
    if (!record) throw notFound(this.def.label);
    return record;
  }

  async detail(id: string): Promise<object> {
    const record = await this.findEntity(id);
    const extras = this.def.detailExtras ? await this.def.detailExtras(record, this.ds.manager) : {};
    return { ...this.def.toJson(record), ...extras };
  }

  async create(body: unknown, user: Express.User): Promise<object> {
    const dto = (await parseDto(this.def.dto, body)) as Record<string, unknown>;
    const id = await this.ds
      .transaction(async (manager) => {
        const ctx = { manager, user };
        const columns = await this.def.toColumns(dto, ctx);
        const saved = await manager.getRepository(this.def.entity).save(manager.getRepository(this.def.entity).create(columns as E));
        if (this.def.afterWrite) await this.def.afterWrite(saved, dto, ctx);
        const id = (saved as ObjectLiteral).id as string;
        const after = this.def.toJson(await this.findEntity(id, manager));
        await audit(manager, { userId: user.id, action: 'create', entity: this.def.path, entityId: id, summary: `${this.def.label} created`, after });
        return id;
      })
      .catch(translateDbError);
    return this.detail(id);
  }

  /** Optimistic locking: the body carries the version it was based on; a stale version gets 409 with the current record. */
  async update(id: string, body: unknown, user: Express.User): Promise<object> {
    const version = (body as { version?: unknown } | null)?.version;
    if (typeof version !== 'number' || !Number.isInteger(version) || version < 1 || version > MAX_VERSION) throw fieldError('version', 'is required: the version you last read');
    const { version: _v, ...rest } = body as Record<string, unknown>;
    const dto = (await parseDto(this.def.dto, rest, { partial: true })) as Record<string, unknown>;
    await this.ds
      .transaction(async (manager) => {
        const existing = await manager.getRepository(this.def.entity).findOne({ where: { id } as never, lock: { mode: 'pessimistic_write' } });
        if (!existing) throw notFound(this.def.label);
        if (existing.version !== version) {
          throw conflict(`Someone else saved this ${this.def.label.toLowerCase()} first (you had version ${version}, it is now ${existing.version}). Review their change and save again.`, {
            current: this.def.toJson(await this.findEntity(id, manager)),
          });
        }
        const ctx = { manager, user, existing };
        const before = this.def.toJson(await this.findEntity(id, manager));
        const columns = await this.def.toColumns(dto, ctx);
        const merged = manager.getRepository(this.def.entity).merge(existing as E, columns as never);
        // Touch the row even when only children change, so its version moves on.
        (merged as ObjectLiteral).updatedAt = new Date();
        const saved = await manager.getRepository(this.def.entity).save(merged);
        if (this.def.afterWrite) await this.def.afterWrite(saved, dto, ctx);
        const after = this.def.toJson(await this.findEntity(id, manager));
        await audit(manager, { userId: user.id, action: 'update', entity: this.def.path, entityId: id, summary: `${this.def.label} changed: ${Object.keys(dto).join(', ')}`, before, after });
      })
      .catch(translateDbError);
    return this.detail(id);
  }

  async remove(id: string, version: unknown, user: Express.User): Promise<void> {
    const v = Number(version);
    if (!Number.isInteger(v) || v < 1 || v > MAX_VERSION) throw fieldError('version', 'is required: the version you last read');
    await this.ds
      .transaction(async (manager) => {
        const existing = await manager.getRepository(this.def.entity).findOne({ where: { id } as never, lock: { mode: 'pessimistic_write' } });
        if (!existing) throw notFound(this.def.label);
        if (existing.version !== v)
          throw conflict(`Someone else changed this ${this.def.label.toLowerCase()} first; reload before deleting.`, { current: this.def.toJson(await this.findEntity(id, manager)) });
        const before = this.def.toJson(await this.findEntity(id, manager));
        await manager.getRepository(this.def.entity).delete(id);
        await audit(manager, { userId: user.id, action: 'delete', entity: this.def.path, entityId: id, summary: `${this.def.label} deleted`, before });
      })
      .catch(translateDbError);
  }
}

/** List, detail, create, update and delete; who may call each is in the policy table (server/auth/policy.ts). */
export function resourceRouter<E extends ObjectLiteral>(ds: DataSource, def: ResourceDef<E>): { router: Router; service: ResourceService<E> } {
  const service = new ResourceService(ds, def);
  const router = Router();
  const r = secured(router);
  const path = `/${def.path}`;
  r.get(path, async (req, res) => {
    res.json(await service.list(await service.parseQuery(req)));
  });
  r.get(`${path}/:id`, async (req, res) => {
    res.json(await service.detail(parseId(req.params.id)));
  });
  r.post(path, async (req, res) => {
    res.status(201).json(await service.create(req.body, req.user!));
  });
  r.patch(`${path}/:id`, async (req, res) => {
    res.json(await service.update(parseId(req.params.id), req.body, req.user!));
  });
  r.delete(`${path}/:id`, async (req, res) => {
    await service.remove(parseId(req.params.id), req.query.version, req.user!);
    res.status(204).end();
  });
  return { router, service };
}
