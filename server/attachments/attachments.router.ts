import { Router } from 'express';
import { pipeline } from 'node:stream/promises';
import type { DataSource } from 'typeorm';
import type { AttachmentRecord, SignedLink } from '../../shared/contract/attachments';
import type { Page } from '../../shared/contract/records';
import { secured } from '../auth/policy';
import type { Sent } from '../common/json';
import { parseId } from '../registry/resource';
import { attachmentDisposition, type Storage } from '../storage/storage';
import type { ReceivingService } from '../receiving/receiving.service';
import { AttachmentsService } from './attachments.service';
import { MAX_ATTACHMENT_BYTES } from './file-kind';
import { singleFileUpload } from '../common/uploads';
import { refuseQuery } from '../common/validate';

const LINK_SECONDS = 120;

/** Files kept with records: the service checks the owner's policy, the store and the type. */
export function attachmentsRouter(ds: DataSource, storage: Storage | null, receiving: ReceivingService): Router {
  const service = new AttachmentsService(ds, storage);
  const router = Router();
  const r = secured(router);
  const upload = singleFileUpload({ fileSize: MAX_ATTACHMENT_BYTES, files: 1, fields: 10 });

  r.post('/attachments', upload, async (req, res) => {
    // A lot's certificate is read by the acceptance rule: the lot is judged again, in the same transaction as
    // the file's row, which may lift its hold.
    const saved = await service.upload(req.user!, req.body, req.file, (tx, a) => (a.purpose === 'certificate' ? receiving.certificateAdded(tx, a.ownerId, req.user!.id) : Promise.resolve()));
    res.status(201).json(saved);
  });

  r.get('/attachments', async (req, res) => {
    refuseQuery(req, ['ownerKind', 'ownerId']);
    const items = await service.list(req.user!.role, req.query);
    res.json({ items, total: items.length, page: 1, pageSize: items.length } satisfies Sent<Page<AttachmentRecord>>);
  });

  // Through the API: the same token and role check as the record it belongs to.
  r.get('/attachments/:id/content', async (req, res) => {
    const { attachment: a, body } = await service.open(req.user!.role, parseId(req.params.id));
    res.setHeader('Content-Type', a.contentType);
    res.setHeader('Content-Length', String(a.sizeBytes));
    res.setHeader('Content-Disposition', attachmentDisposition(a.fileName));
    res.setHeader('X-Content-Type-Options', 'nosniff');
    // Once the headers are out an error can only cut the answer short, which the client sees as a failed download.
    await pipeline(body, res).catch(() => res.destroy());
  });

  // A short-lived signed link for clients that reach the bucket directly.
  r.get('/attachments/:id/url', async (req, res) => {
    res.json({ url: await service.signedUrl(req.user!.role, parseId(req.params.id), LINK_SECONDS), expiresInSeconds: LINK_SECONDS } satisfies SignedLink);
  });

  return router;
}
