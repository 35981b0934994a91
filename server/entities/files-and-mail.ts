import { Column, Entity, JoinColumn, ManyToOne } from 'typeorm';
import { Base } from './base';
import { NullableText, NullableUuid, Text, Uuid } from './columns';
import { User } from './user';
import { ATTACHMENT_OWNERS, ATTACHMENT_PURPOSES, type AttachmentOwnerKind, type AttachmentPurpose } from '../../shared/contract/attachments';
import type { ImportCounts, ImportKind, ImportOutcome, ImportRowError } from '../../shared/contract/imports';

export { ATTACHMENT_OWNERS, ATTACHMENT_PURPOSES, type AttachmentPurpose, type ImportKind };
export type AttachmentOwner = AttachmentOwnerKind;

/** File names are kept up to 255 characters, cut by code point so a name never ends in half a UTF-16 pair. */
export const FILE_NAME_LENGTH = 255;
export const fitFileName = (name: string) => Array.from(name).slice(0, FILE_NAME_LENGTH).join('');

@Entity({ name: 'attachments' })
export class Attachment extends Base {
  @Text('owner_kind', 20) ownerKind: AttachmentOwner;
  @Uuid('owner_id') ownerId: string;
  @Text('file_name', FILE_NAME_LENGTH) fileName: string;
  @Text('content_type', 100) contentType: string;
  @Column({ name: 'size_bytes', type: 'integer' }) sizeBytes: number;
  @Text('storage_key', 300) storageKey: string;
  @Text('purpose', 12, { default: 'file' }) purpose: AttachmentPurpose;
  @Uuid('uploaded_by_id') uploadedById: string;
  @ManyToOne(() => User) @JoinColumn({ name: 'uploaded_by_id' }) uploadedBy?: User;
}

@Entity({ name: 'imports' })
export class ImportRecord extends Base {
  @Text('kind', 12) kind: ImportKind;
  @Text('file_name', FILE_NAME_LENGTH) fileName: string;
  @Column({ name: 'dry_run', type: 'boolean' }) dryRun: boolean;
  @Text('outcome', 10) outcome: ImportOutcome;
  @Text('encoding', 20) encoding: string;
  @Text('delimiter', 4) delimiter: string;
  @Column({ name: 'counts', type: 'jsonb' }) counts: ImportCounts;
  @Column({ name: 'errors', type: 'jsonb' }) errors: ImportRowError[];
  @NullableUuid('attachment_id') attachmentId: string | null;
  @Uuid('by_id') byId: string;
  @ManyToOne(() => User) @JoinColumn({ name: 'by_id' }) by?: User;
}

@Entity({ name: 'outbox' })
export class OutboxMessage extends Base {
  @Text('kind', 20) kind: string;
  @NullableUuid('to_user_id') toUserId: string | null;
  @Text('to_email', 254) toEmail: string;
  @Text('subject', 300) subject: string;
  @Column({ name: 'text_body', type: 'text' }) textBody: string;
  @Column({ name: 'html_body', type: 'text' }) htmlBody: string;
  @Text('status', 8, { default: 'pending' }) status: 'pending' | 'sent';
  @Column({ name: 'attempts', type: 'integer', default: 0 }) attempts: number;
  @NullableText('last_error', 1000) lastError: string | null;
  @Column({ name: 'next_attempt_at', type: 'timestamptz' }) nextAttemptAt: Date;
  @Column({ name: 'sent_at', type: 'timestamptz', nullable: true }) sentAt: Date | null;
}
