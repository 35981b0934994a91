import { fromBuffer } from 'file-type';

/** What an upload really is, read from its bytes (never from its name). */
export const ATTACHMENT_TYPES = new Set(['application/pdf', 'image/jpeg', 'image/png', 'image/webp', 'image/heic', 'image/heif']);
export const MAX_ATTACHMENT_BYTES = 10 * 1024 * 1024;

export async function sniffType(bytes: Buffer): Promise<string | null> {
  const found = await fromBuffer(bytes);
  return found?.mime ?? null;
}
