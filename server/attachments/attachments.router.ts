import { secured } from '../auth/policy';
import { randomUUID } from 'node:crypto';
import { Router, type Request } from 'express';
import multer from 'multer';
import type { DataSource, EntityTarget, ObjectLiteral } from 'typeorm';
import type { Role } from '../../shared/roles';
import { forbidden, HttpError, notFound } from '../common/errors';
import { fieldError } from '../common/errors';
import { Attachment, ATTACHMENT_OWNERS, ATTACHMENT_PURPOSES, Connector, DipTube, DrumType, ImportRecord, ReceivingCheck, type AttachmentOwner, type AttachmentPurpose } from '../entities';
import { ReceivingService } from '../receiving/receiving.service';
import { parseId } from '../registry/resource';
import type { Storage } from '../storage/storage';
import { ATTACHMENT_TYPES, MAX_ATTACHMENT_BYTES, sniffType } from './file-kind';

/** Who may attach to each kind of record: the same roles that may change that record. Everyone signed in reads. */
const OWNERS: Record<AttachmentOwner, { entity: EntityTarget<ObjectLiteral>; label: string; writers: Role[] }> = {
  'drum-type': { entity: DrumType, label: 'drum type', writers: ['engineer', 'admin'] },
  'dip-tube': { entity: DipTube, label: 'dip tube', writers: ['engineer', 'admin'] },
  connector: { entity: Connector, label: 'connector', writers: ['engineer', 'admin'] },
  'receiving-check': { entity: ReceivingCheck, label: 'receiving check', writers: ['clerk', 'engineer', 'admin'] },
  import: { entity: ImportRecord, label: 'import', writers: ['engineer', 'admin'] },
};

export const attachmentJson = (a: Attachment) => ({
  id: a.id,
  ownerKind: a.ownerKind,
  ownerId: a.ownerId,
  fileName: a.fileName,
  contentType: a.contentType,
  sizeBytes: a.sizeBytes,
  purpose: a.purpose,
  uploadedByName: a.uploadedBy?.displayName ?? null,
  createdAt: a.createdAt,
});

function ownerKindOf(value: unknown, field = 'ownerKind'): AttachmentOwner {
  if (typeof value !== 'string' || !(ATTACHMENT_OWNERS as readonly string[]).includes(value)) throw fieldError(field, `must be one of ${ATTACHMENT_OWNERS.join(', ')}`);
  return value as AttachmentOwner;
}

/** 'certificate' marks a dock check's certificate of analysis; anything else is a plain file. */
function purposeOf(value: unknown, ownerKind: AttachmentOwner): AttachmentPurpose {
  if (value === undefined || value === '') return 'file';
  if (typeof value !== 'string' || !(ATTACHMENT_PURPOSES as readonly string[]).includes(value)) throw fieldError('purpose', `must be one of ${ATTACHMENT_PURPOSES.join(', ')}`);
  if (value === 'certificate' && ownerKind !== 'receiving-check') throw fieldError('purpose', 'a certificate of analysis belongs to a receiving check');
  return value as AttachmentPurpose;
}

export function storageUnavailable(): HttpError {
  return new HttpError(503, 'storage_unavailable', 'File storage is not configured: set S3_BUCKET (and S3_ENDPOINT for a local store).');
}

/** Stores an upload's bytes and its record; shared with the import, which keeps each file it reads. */
export async function storeAttachment(ds: DataSource, storage: Storage, args: { ownerKind: AttachmentOwner; ownerId: string; fileName: string; contentType: string; bytes: Buffer; userId: string; purpose?: AttachmentPurpose }): Promise<Attachment> {
  const key = `${args.ownerKind}/${args.ownerId}/${randomUUID()}`;
  await storage.put(key, args.bytes, args.contentType);
  return ds.getRepository(Attachment).save(
    ds.getRepository(Attachment).create({ ownerKind: args.ownerKind, ownerId: args.ownerId, fileName: args.fileName.slice(0, 255), contentType: args.contentType, sizeBytes: args.bytes.length, storageKey: key, uploadedById: args.userId, purpose: args.purpose ?? 'file' }),
  );
}

export function attachmentsRouter(ds: DataSource, storage: Storage | null, clock?: () => Date): Router {
  const router = Router();
  const receiving = new ReceivingService(ds, clock);
  const r = secured(router);
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_ATTACHMENT_BYTES, files: 1, fields: 10 } });
  const need = () => {
    if (!storage) throw storageUnavailable();
    return storage;
  };

  r.post('/attachments', upload.single('file'), async (req: Request, res) => {
    const store = need();
    const ownerKind = ownerKindOf(req.body?.ownerKind);
    const ownerId = parseId(req.body?.ownerId);
    const purpose = purposeOf(req.body?.purpose, ownerKind);
    const owner = OWNERS[ownerKind];
    if (!owner.writers.includes(req.user!.role)) throw forbidden(`Attaching to a ${owner.label} needs the role ${owner.writers.join(' or ')}.`);
    if (!(await ds.getRepository(owner.entity).existsBy({ id: ownerId }))) throw fieldError('ownerId', `does not name an existing ${owner.label}`);
    const file = req.file;
    if (!file) throw fieldError('file', 'is required: a PDF or a photo');
    const type = await sniffType(file.buffer);
    if (!type || !ATTACHMENT_TYPES.has(type)) {
      throw new HttpError(415, 'unsupported_type', `The file's content is ${type ?? 'not a recognised format'}; attach a PDF or a JPEG, PNG, WebP or HEIC photo.`, [{ field: 'file', messages: ['must be a PDF or a photo'] }]);
    }
    const saved = await storeAttachment(ds, store, { ownerKind, ownerId, fileName: file.originalname || 'upload', contentType: type, bytes: file.buffer, userId: req.user!.id, purpose });
    // A lot's certificate is read by the acceptance rule: the lot is judged again, which may lift its hold.
    if (purpose === 'certificate') await ds.transaction((m) => receiving.certificateAdded(m, ownerId, req.user!.id));
    res.status(201).json(attachmentJson(saved));
  });

  r.get('/attachments', async (req, res) => {
    const ownerKind = ownerKindOf(req.query.ownerKind);
    const ownerId = parseId(req.query.ownerId);
    const items = await ds.getRepository(Attachment).find({ where: { ownerKind, ownerId }, relations: { uploadedBy: true }, order: { createdAt: 'DESC' } });
    res.json({ items: items.map(attachmentJson), total: items.length, page: 1, pageSize: items.length });
  });

  const load = async (id: string) => {
    const a = await ds.getRepository(Attachment).findOneBy({ id });
    if (!a) throw notFound('Attachment');
    return a;
  };

  // Through the API: the same token and role check as the record it belongs to.
  r.get('/attachments/:id/content', async (req, res) => {
    const store = need();
    const a = await load(parseId(req.params.id));
    const obj = await store.get(a.storageKey);
    res.setHeader('Content-Type', a.contentType);
    res.setHeader('Content-Length', String(a.sizeBytes));
    res.setHeader('Content-Disposition', `attachment; filename="${a.fileName.replace(/[^\w.\- ]/g, '_')}"`);
    res.setHeader('X-Content-Type-Options', 'nosniff');
    obj.body.pipe(res);
  });

  // A two-minute signed link for clients that reach the bucket directly.
  r.get('/attachments/:id/url', async (req, res) => {
    const store = need();
    const a = await load(parseId(req.params.id));
    res.json({ url: await store.signedUrl(a.storageKey, a.fileName, 120), expiresInSeconds: 120 });
  });

  return router;
}
