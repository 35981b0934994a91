import { secured } from '../auth/policy';
import { stringify } from 'csv-stringify/sync';
import { Router } from 'express';
import type { DataSource, ObjectLiteral } from 'typeorm';
import { notFound } from '../common/errors';
import { RESOURCES } from '../registry/resources';
import { ResourceService } from '../registry/resource';

/**
 * One CSV cell: dates as plain ISO 8601 (JSON.stringify would wrap them in quotes of their own, which the
 * CSV writer then doubles), other objects as JSON. A cell a spreadsheet would run as a formula (= + - @,
 * tab, CR) gets a leading apostrophe.
 */
export function neutralise(value: unknown): string {
  if (value === null || value === undefined) return '';
  const s = value instanceof Date ? value.toISOString() : typeof value === 'object' ? JSON.stringify(value) : String(value);
  return /^[=+\-@\t\r]/.test(s) ? `'${s}` : s;
}

/** CSV exports of every registry table, with the same search and filters as the list. */
export function exportsRouter(ds: DataSource): Router {
  const router = Router();
  const r = secured(router);
  const services = new Map(RESOURCES.map((def) => [def.path, new ResourceService<ObjectLiteral>(ds, def)]));
  r.get('/exports/:resource', async (req, res) => {
    const resource = String(req.params.resource).replace(/\.csv$/, '');
    const service = services.get(resource);
    if (!service) throw notFound(`The registry table ${resource}`);
    // The same checks as the list: sort keys and filters of this table only.
    const query = await service.parseQuery(req);
    const rows: object[] = [];
    // Pages of 200 through the list query: the export sees exactly what the list shows.
    for (let page = 1; ; page++) {
      const out = await service.list({ ...query, page, pageSize: 200 });
      rows.push(...out.items);
      if (rows.length >= out.total || out.items.length === 0 || rows.length >= 100_000) break;
    }
    const columns = [...new Set(rows.flatMap((r) => Object.keys(r)))].filter((c) => !['openings', 'createdAt'].includes(c));
    const records = rows.map((r) => columns.map((c) => neutralise((r as Record<string, unknown>)[c])));
    // Drum types: their openings as one readable cell.
    if (resource === 'drum-types') {
      columns.push('openings');
      rows.forEach((r, i) => records[i].push(neutralise(((r as { openings?: Array<{ label: string; threadCode: string }> }).openings ?? []).map((o) => `${o.label}: ${o.threadCode}`).join('; '))));
    }
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="bungwise-${resource}.csv"`);
    res.send(stringify([columns, ...records]));
  });
  return router;
}
