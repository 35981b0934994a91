import { Router } from 'express';
import { IsIn, IsOptional, IsString, IsUUID, MaxLength } from 'class-validator';
import type { DataSource, EntityManager } from 'typeorm';
import { secured } from '../auth/policy';
import { IsDateOrTimestamp, PageParam, PageSizeParam } from '../common/fields';
import { parseQuery } from '../common/validate';

export interface AuditEvent {
  userId: string | null;
  action: string;
  entity: string;
  entityId?: string | null;
  summary: string;
  before?: unknown;
  after?: unknown;
}

/** Appends one entry in the caller's transaction: the change and its record land together or not at all. */
export async function audit(m: EntityManager, e: AuditEvent): Promise<void> {
  await m.query(`INSERT INTO audit_log (user_id, action, entity, entity_id, summary, before, after) VALUES ($1, $2, $3, $4, $5, $6, $7)`, [
    e.userId,
    e.action,
    e.entity,
    e.entityId ?? null,
    e.summary.slice(0, 500),
    e.before === undefined ? null : JSON.stringify(e.before),
    e.after === undefined ? null : JSON.stringify(e.after),
  ]);
}

class AuditQueryDto {
  @IsOptional() @IsString({ message: 'must be given once, as text' }) @MaxLength(30) entity?: string;
  @IsOptional() @IsUUID('all', { message: 'must be an id' }) entityId?: string;
  @IsOptional() @IsUUID('all', { message: 'must be an id' }) userId?: string;
  @IsOptional() @IsString({ message: 'must be given once, as text' }) @MaxLength(20) action?: string;
  @IsOptional() @IsDateOrTimestamp() from?: string;
  @IsOptional() @IsDateOrTimestamp() to?: string;
  @PageParam page?: number;
  @PageSizeParam pageSize?: number;
  @IsOptional() @IsIn(['asc', 'desc'], { message: 'must be asc or desc' }) order?: 'asc' | 'desc';
}

/** Read-only: engineers and admins filter the log; nothing in the API writes or edits it directly. */
export function auditRouter(ds: DataSource): Router {
  const router = Router();
  const r = secured(router);
  r.get('/audit', async (req, res) => {
    const q = await parseQuery(AuditQueryDto, req);
    const where: string[] = [];
    const params: unknown[] = [];
    const add = (sql: string, v: unknown) => {
      params.push(v);
      where.push(sql.replace('?', `$${params.length}`));
    };
    if (q.entity) add('a.entity = ?', q.entity);
    if (q.entityId) add('a.entity_id = ?', q.entityId);
    if (q.userId) add('a.user_id = ?', q.userId);
    if (q.action) add('a.action = ?', q.action);
    if (q.from) add('a.at >= ?', q.from);
    if (q.to) add('a.at <= ?', q.to);
    const page = q.page ?? 1;
    const pageSize = q.pageSize ?? 50;
    const filter = where.length ? `WHERE ${where.join(' AND ')}` : '';
    const [rows, count] = await Promise.all([
      ds.query(
        `SELECT a.id, a.at, a.user_id AS "userId", u.display_name AS "userName", a.action, a.entity, a.entity_id AS "entityId", a.summary, a.before, a.after
         FROM audit_log a LEFT JOIN users u ON u.id = a.user_id ${filter} ORDER BY a.at ${q.order === 'asc' ? 'ASC' : 'DESC'}, a.id LIMIT ${pageSize} OFFSET ${(page - 1) * pageSize}`,
        params,
      ),
      ds.query(`SELECT count(*)::int AS n FROM audit_log a ${filter}`, params),
    ]);
    res.json({ items: rows, total: count[0].n, page, pageSize });
  });
  return router;
}
