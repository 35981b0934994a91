import { CreateBucketCommand, DeleteObjectCommand, GetObjectCommand, HeadBucketCommand, ListObjectsV2Command, PutObjectCommand, S3Client, S3ServiceException } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { create as contentDisposition } from 'content-disposition';
import type { Readable } from 'node:stream';
import { HttpError, notFound } from '../common/errors';

export interface StorageConfig {
  endpoint?: string;
  region: string;
  bucket: string;
  accessKeyId?: string;
  secretAccessKey?: string;
  /** Path-style addressing, which local S3 fakes need; hosted S3 works either way. */
  forcePathStyle: boolean;
}

/** From S3_ENDPOINT, S3_BUCKET, S3_REGION and the credentials; a real bucket works with no code change. */
export function storageConfigFromEnv(env = process.env): StorageConfig | null {
  if (!env.S3_BUCKET) return null;
  return {
    endpoint: env.S3_ENDPOINT || undefined,
    region: env.S3_REGION ?? 'us-east-1',
    bucket: env.S3_BUCKET,
    accessKeyId: env.S3_ACCESS_KEY_ID ?? env.AWS_ACCESS_KEY_ID,
    secretAccessKey: env.S3_SECRET_ACCESS_KEY ?? env.AWS_SECRET_ACCESS_KEY,
    forcePathStyle: env.S3_FORCE_PATH_STYLE ? env.S3_FORCE_PATH_STYLE === '1' : !!env.S3_ENDPOINT,
  };
}

/** The answer when the store cannot be used: file storage named, so nobody goes looking at the database. */
export const storageUnavailable = (message = 'File storage is unavailable; try again shortly. Nothing was saved.') => new HttpError(503, 'storage_unavailable', message);
export const storageNotConfigured = () => storageUnavailable('File storage is not configured: set S3_BUCKET (and S3_ENDPOINT for a local store).');

/**
 * A store failure as the one error family: a missing object is a 404; anything else (refused or timed-out
 * connections, 5xx answers, credentials the store refuses) means files cannot be stored or read now: 503.
 */
export function translateStorageError(err: unknown, key?: string): HttpError {
  if (err instanceof HttpError) return err;
  const name = (err as { name?: string })?.name;
  if (key && (name === 'NoSuchKey' || name === 'NotFound')) return notFound('The file in storage');
  console.error(`[bungwise] file storage: ${name ?? 'error'}: ${(err as Error)?.message ?? String(err)}`);
  return storageUnavailable();
}

/** RFC 6266 Content-Disposition with the name in UTF-8 (RFC 8187 `filename*`) and an ASCII fallback. */
export function attachmentDisposition(fileName: string): string {
  const fallback = fileName.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
  return contentDisposition(fileName, { fallback });
}

export interface StoredObject {
  key: string;
  lastModified: Date | null;
}

/** Object storage for attachments and imported files. */
export class Storage {
  private readonly client: S3Client;
  private bucketChecked = false;

  constructor(readonly config: StorageConfig) {
    this.client = new S3Client({
      endpoint: config.endpoint,
      region: config.region,
      forcePathStyle: config.forcePathStyle,
      credentials: config.accessKeyId && config.secretAccessKey ? { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey } : undefined,
      // Checksums only where the protocol requires them: some S3-compatible stores do not implement the newer ones.
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
      // A store that does not answer is an outage to report, not a request to keep open (each of the SDK's 3 tries).
      requestHandler: { connectionTimeout: 3_000, requestTimeout: 30_000 },
    });
  }

  /** Creates the bucket on first use when it is missing (the local fake starts empty); an unreachable store is an outage. */
  private async ensureBucket(): Promise<void> {
    if (this.bucketChecked) return;
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.config.bucket }));
    } catch (err) {
      if ((err as S3ServiceException)?.$metadata?.httpStatusCode !== 404) throw translateStorageError(err);
      try {
        await this.client.send(new CreateBucketCommand({ Bucket: this.config.bucket }));
      } catch (createErr) {
        // Another process may have created it meanwhile.
        if ((createErr as { name?: string })?.name !== 'BucketAlreadyOwnedByYou') throw translateStorageError(createErr);
      }
    }
    this.bucketChecked = true;
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.ensureBucket();
    try {
      await this.client.send(new PutObjectCommand({ Bucket: this.config.bucket, Key: key, Body: body, ContentType: contentType }));
    } catch (err) {
      throw translateStorageError(err);
    }
  }

  async get(key: string): Promise<{ body: Readable; contentType?: string; length?: number }> {
    try {
      const out = await this.client.send(new GetObjectCommand({ Bucket: this.config.bucket, Key: key }));
      return { body: out.Body as Readable, contentType: out.ContentType, length: out.ContentLength };
    } catch (err) {
      throw translateStorageError(err, key);
    }
  }

  async delete(key: string): Promise<void> {
    try {
      await this.client.send(new DeleteObjectCommand({ Bucket: this.config.bucket, Key: key }));
    } catch (err) {
      throw translateStorageError(err);
    }
  }

  /** Every object under a prefix, a page (up to 1,000) at a time. */
  async *list(prefix: string): AsyncGenerator<StoredObject[]> {
    await this.ensureBucket();
    let token: string | undefined;
    do {
      let page;
      try {
        page = await this.client.send(new ListObjectsV2Command({ Bucket: this.config.bucket, Prefix: prefix, ContinuationToken: token }));
      } catch (err) {
        throw translateStorageError(err);
      }
      yield (page.Contents ?? []).filter((o) => o.Key).map((o) => ({ key: o.Key!, lastModified: o.LastModified ?? null }));
      token = page.IsTruncated ? page.NextContinuationToken : undefined;
    } while (token);
  }

  /** A short-lived download link (seconds), for clients that can reach the store directly. Signed here: no call to the store. */
  signedUrl(key: string, fileName: string, ttlSeconds = 120): Promise<string> {
    return getSignedUrl(this.client, new GetObjectCommand({ Bucket: this.config.bucket, Key: key, ResponseContentDisposition: attachmentDisposition(fileName) }), { expiresIn: ttlSeconds });
  }
}
