// Files kept with records (GET /attachments, POST /attachments).

/** The kinds of record a file can belong to. */
export const ATTACHMENT_OWNERS = ['drum-type', 'dip-tube', 'connector', 'receiving-check', 'import'] as const;
export type AttachmentOwnerKind = (typeof ATTACHMENT_OWNERS)[number];
/** A file is a plain file, or the certificate of analysis of the lot it belongs to (the acceptance rule reads it). */
export const ATTACHMENT_PURPOSES = ['file', 'certificate'] as const;
export type AttachmentPurpose = (typeof ATTACHMENT_PURPOSES)[number];

export interface AttachmentRecord {
  id: string;
  ownerKind: AttachmentOwnerKind;
  ownerId: string;
  fileName: string;
  /** What the server read from the bytes, not what the name says. */
  contentType: string;
  sizeBytes: number;
  purpose: AttachmentPurpose;
  uploadedByName: string | null;
  createdAt: string;
}

/** GET /attachments/:id/url: a short-lived signed link to the file in the store. */
export interface SignedLink {
  url: string;
  expiresInSeconds: number;
}
