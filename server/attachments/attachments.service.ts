import { randomUUID } from 'node:crypto';
import type { Readable } from 'node:stream';
import type { DataSource, EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import type { Role } from '../../shared/contract/roles';
import { POLICY, type Access } from '../auth/policy';
import { fieldError, forbidden, HttpError, notFound } from '../common/errors';
import { Attachment, ATTACHMENT_OWNERS, ATTACHMENT_PURPOSES, Connector, fitFileName, DipTube, DrumType, ImportRecord, ReceivingCheck, type AttachmentOwner, type AttachmentPurpose } from '../entities';
import { parseId } from '../registry/resource';
import { storageNotConfigured, type Storage } from '../storage/storage';
import { ATTACHMENT_TYPES, sniffType } from './file-kind';
import type { AttachmentRecord } from '../../shared/contract/attachments';
import { copyOf, nameOf, type Sent } from '../common/json';

/**
 * Each kind of record files are kept with, and the routes whose access its files follow: reading a file needs
 * what reading the record needs, attaching one what changing it needs (an import's file: what importing needs).
 */
const OWNERS: ReadonlyMap<AttachmentOwner, { entity: EntityTarget<ObjectLiteral>; label: string; read: string; write: string }> = new Map<
  AttachmentOwner,
  { entity: EntityTarget<ObjectLiteral>; label: string; read: string; write: string }
>([
  ['drum-type', { entity: DrumType, label: 'drum type', read: 'GET /api/drum-types/:id', write: 'PATCH /api/drum-types/:id' }],
  ['dip-tube', { entity: DipTube, label: 'dip tube', read: 'GET /api/dip-tubes/:id', write: 'PATCH /api/dip-tubes/:id' }],
  ['connector', { entity: Connector, label: 'connector', read: 'GET /api/connectors/:id', write: 'PATCH /api/connectors/:id' }],
  ['receiving-check', { entity: ReceivingCheck, label: 'receiving check', read: 'GET /api/receiving-checks/:id', write: 'POST /api/receiving-checks' }],
  ['import', { entity: ImportRecord, label: 'import', read: 'GET /api/imports/:id', write: 'POST /api/imports' }],
]);
// Like secured(): a kind whose routes have no policy line stops the server at start-up rather than guess.
for (const [kind, o] of OWNERS) {
  for (const key of [o.read, o.write]) if (!POLICY[key]) throw new Error(`Attachments of ${kind} follow ${key}, which has no line in POLICY (server/auth/policy.ts)`);
}

const allows = (access: Access, role: Role) => access === 'public' || access === 'signed-in' || access.includes(role);

export const attachmentJson = (a: Attachment) =>
  ({ ...copyOf(a, ['id', 'ownerKind', 'ownerId', 'fileName', 'contentType', 'sizeBytes', 'purpose', 'createdAt']), uploadedByName: nameOf(a.uploadedBy) }) satisfies Sent<AttachmentRecord>;

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

/** What else an upload writes in its transaction (a certificate makes its lot be judged again). */
export type AfterUpload = (tx: EntityManager, attachment: Attachment) => Promise<void>;

export interface NewFile {
  ownerKind: AttachmentOwner;
  ownerId: string;
  fileName: string;
  contentType: string;
  bytes: Buffer;
  userId: string;
  purpose?: AttachmentPurpose;
}
/** A file whose bytes are in the store and whose row is not yet written. */
export interface PendingFile extends NewFile {
  key: string;
}

/** Files kept with registry records, receiving checks and imports: bytes in object storage, one row each. */
export class AttachmentsService {
  constructor(
    private readonly ds: DataSource,
    private readonly storage: Storage | null,
  ) {}

  get enabled(): boolean {
    return this.storage !== null;
  }

  private store(): Storage {
    if (!this.storage) throw storageNotConfigured();
    return this.storage;
  }

  /** 403 unless the role may read (or attach to) that kind of record, by the record's own policy. */
  assertMay(role: Role, kind: AttachmentOwner, action: 'read' | 'write'): void {
    const owner = OWNERS.get(kind)!;
    const access = POLICY[owner[action]];
    if (allows(access, role)) return;
    const who = Array.isArray(access) ? ` needs the role ${access.join(' or ')}` : ' is not allowed';
    throw forbidden(action === 'read' ? `Reading the files of a ${owner.label}${who}.` : `Attaching to a ${owner.label}${who}.`);
  }

  /** Step 1 of keeping a file: its bytes go to the store under a new key (a store cannot join a database transaction). */
  async put(file: NewFile): Promise<PendingFile> {
    const key = `${file.ownerKind}/${file.ownerId}/${randomUUID()}`;
    await this.store().put(key, file.bytes, file.contentType);
    return { ...file, key };
  }

  /** Step 2: its row, inside the caller's transaction, so it exists exactly when the caller's work commits. */
  record(tx: EntityManager, file: PendingFile): Promise<Attachment> {
    return tx.save(
      tx.create(Attachment, {
        ownerKind: file.ownerKind,
        ownerId: file.ownerId,
        fileName: fitFileName(file.fileName),
        contentType: file.contentType,
        sizeBytes: file.bytes.length,
        storageKey: file.key,
        uploadedById: file.userId,
        purpose: file.purpose ?? 'file',
      }),
    );
  }

  /** When the transaction failed: the object goes too. If this fails as well, `sweep` removes it later. */
  async discard(file: PendingFile): Promise<void> {
    await this.store()
      .delete(file.key)
      .catch((err) => console.error(`[bungwise] could not remove ${file.key} after a failed write (the sweep will): ${(err as Error).message}`));
  }

  /**
   * Keeps a file and whatever `work` writes in one transaction: put the bytes, then the row and the work
   * together; when the transaction fails the object is removed. A process killed between the put and the
   * commit leaves an object with no row (never a row with no object), which `sweep` finds.
   */
  async keepWith<T>(file: NewFile, work: (tx: EntityManager, attachment: Attachment) => Promise<T>): Promise<T> {
    const pending = await this.put(file);
    try {
      return await this.ds.transaction(async (tx) => work(tx, await this.record(tx, pending)));
    } catch (err) {
      await this.discard(pending);
      throw err;
    }
  }

  /** POST /api/attachments: a PDF or a photo for a record the person may change. */
  async upload(user: { id: string; role: Role }, body: Record<string, unknown> | undefined, file: Express.Multer.File | undefined, after?: AfterUpload) {
    this.store(); // without a store, 503 before anything else
    const ownerKind = ownerKindOf(body?.ownerKind);
    const ownerId = parseId(body?.ownerId);
    this.assertMay(user.role, ownerKind, 'write');
    const purpose = purposeOf(body?.purpose, ownerKind);
    const owner = OWNERS.get(ownerKind)!;
    if (!(await this.ds.getRepository(owner.entity).existsBy({ id: ownerId }))) throw fieldError('ownerId', `does not name an existing ${owner.label}`);
    if (!file) throw fieldError('file', 'is required: a PDF or a photo');
    const type = await sniffType(file.buffer);
    if (!type || !ATTACHMENT_TYPES.has(type)) {
      throw new HttpError(415, 'unsupported_type', `The file's content is ${type ?? 'not a recognised format'}; attach a PDF or a JPEG, PNG, WebP or HEIC photo.`, [
        { field: 'file', messages: ['must be a PDF or a photo'] },
      ]);
    }
    const saved = await this.keepWith({ ownerKind, ownerId, fileName: file.originalname || 'upload', contentType: type, bytes: file.buffer, userId: user.id, purpose }, async (tx, a) => {
      await after?.(tx, a);
      return a;
    });
    return attachmentJson(saved);
  }

  async list(role: Role, query: Record<string, unknown>) {
    const ownerKind = ownerKindOf(query.ownerKind);
    const ownerId = parseId(query.ownerId);
    this.assertMay(role, ownerKind, 'read');
    const items = await this.ds.getRepository(Attachment).find({ where: { ownerKind, ownerId }, relations: { uploadedBy: true }, order: { createdAt: 'DESC' } });
    return items.map(attachmentJson);
  }

  /** One file's row, for someone who may read its record. */
  async find(role: Role, id: string): Promise<Attachment> {
    this.store(); // without a store, 503 before anything else
    const a = await this.ds.getRepository(Attachment).findOneBy({ id });
    if (!a) throw notFound('Attachment');
    this.assertMay(role, a.ownerKind, 'read');
    return a;
  }

  async open(role: Role, id: string): Promise<{ attachment: Attachment; body: Readable }> {
    const attachment = await this.find(role, id);
    const { body } = await this.store().get(attachment.storageKey);
    return { attachment, body };
  }

  async signedUrl(role: Role, id: string, ttlSeconds: number): Promise<string> {
    const a = await this.find(role, id);
    return this.store().signedUrl(a.storageKey, a.fileName, ttlSeconds);
  }

  /**
   * Removes objects that no row names and that are older than `olderThanMs` (an import or upload in flight has
   * put its object and not yet committed its row): what a process killed between the two leaves behind.
   */
  async sweep({ olderThanMs = 60 * 60 * 1000, prefixes = ATTACHMENT_OWNERS.map((k) => `${k}/`) }: { olderThanMs?: number; prefixes?: string[] } = {}): Promise<{ checked: number; deleted: string[] }> {
    const store = this.store();
    const before = Date.now() - olderThanMs;
    const deleted: string[] = [];
    let checked = 0;
    for (const prefix of prefixes) {
      for await (const page of store.list(prefix)) {
        checked += page.length;
        const old = page.filter((o) => !o.lastModified || o.lastModified.getTime() <= before).map((o) => o.key);
        if (!old.length) continue;
        const rows: Array<{ storage_key: string }> = await this.ds.query(`SELECT storage_key FROM attachments WHERE storage_key = ANY($1::text[])`, [old]);
        const named = new Set(rows.map((r) => r.storage_key));
        for (const key of old.filter((k) => !named.has(k))) {
          await store.delete(key);
          deleted.push(key);
        }
      }
    }
    return { checked, deleted };
  }
}
