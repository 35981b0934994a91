import { secured } from '../auth/policy';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { fieldError, notFound } from '../common/errors';
import { singleFileUpload } from '../common/uploads';
import { refuseQuery } from '../common/validate';
import { ImportRecord, type ImportKind } from '../entities';
import { parseId } from '../registry/resource';
import type { Storage } from '../storage/storage';
import { AttachmentsService } from '../attachments/attachments.service';
import { templateCsv } from './columns';
import { importJson, ImportService, type ImportOptions } from './import.service';
import { IMPORT_KINDS, type ImportHistoryItem } from '../../shared/contract/imports';
import type { Page } from '../../shared/contract/records';
import type { Sent } from '../common/json';

export const MAX_IMPORT_BYTES = 20 * 1024 * 1024;

function kindOf(value: unknown): ImportKind {
  if (typeof value !== 'string' || !(IMPORT_KINDS as readonly string[]).includes(value)) throw fieldError('kind', `must be one of ${IMPORT_KINDS.join(', ')}`);
  return value as ImportKind;
}

export function importsRouter(ds: DataSource, storage: Storage | null, options: ImportOptions = {}): Router {
  const service = new ImportService(ds, new AttachmentsService(ds, storage), options);
  const upload = singleFileUpload({ fileSize: MAX_IMPORT_BYTES, files: 1, fields: 10 });
  const router = Router();
  const r = secured(router);

  r.get('/imports/templates/:kind', (req, res) => {
    const kind = kindOf(req.params.kind);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="bungwise-${kind}-template.csv"`);
    res.send(templateCsv(kind));
  });

  r.post('/imports', upload, async (req, res) => {
    const kind = kindOf(req.body?.kind);
    const dryRunRaw = String(req.body?.dryRun ?? '');
    if (!['true', 'false'].includes(dryRunRaw)) throw fieldError('dryRun', 'must be true or false');
    if (!req.file) throw fieldError('file', 'is required: a CSV file');
    const result = await service.run({ kind, dryRun: dryRunRaw === 'true', fileName: req.file.originalname || `${kind}.csv`, bytes: req.file.buffer, userId: req.user!.id });
    res.status(dryRunRaw === 'true' ? 200 : 201).json(result);
  });

  r.get('/imports', async (req, res) => {
    refuseQuery(req);
    const items = await service.history();
    res.json({ items, total: items.length, page: 1, pageSize: items.length } satisfies Sent<Page<ImportHistoryItem>>);
  });

  r.get('/imports/:id', async (req, res) => {
    const r = await ds.getRepository(ImportRecord).findOne({ where: { id: parseId(req.params.id) }, relations: { by: true } });
    if (!r) throw notFound('Import');
    res.json(importJson(r));
  });

  return router;
}
