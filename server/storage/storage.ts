import { CreateBucketCommand, GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import type { Readable } from 'node:stream';

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
    });
  }

  /** Creates the bucket on first use when it is missing (the local fake starts empty). */
  private async ensureBucket(): Promise<void> {
    if (this.bucketChecked) return;
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.config.bucket }));
    } catch {
      await this.client.send(new CreateBucketCommand({ Bucket: this.config.bucket })).catch(() => undefined);
    }
    this.bucketChecked = true;
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.ensureBucket();
    await this.client.send(new PutObjectCommand({ Bucket: this.config.bucket, Key: key, Body: body, ContentType: contentType }));
  }

  async get(key: string): Promise<{ body: Readable; contentType?: string; length?: number }> {
    const out = await this.client.send(new GetObjectCommand({ Bucket: this.config.bucket, Key: key }));
    return { body: out.Body as Readable, contentType: out.ContentType, length: out.ContentLength };
  }

  /** A short-lived download link (seconds), for clients that can reach the store directly. */
  signedUrl(key: string, fileName: string, ttlSeconds = 120): Promise<string> {
    return getSignedUrl(this.client, new GetObjectCommand({ Bucket: this.config.bucket, Key: key, ResponseContentDisposition: `attachment; filename="${fileName.replace(/[^\w.\- ]/g, '_')}"` }), { expiresIn: ttlSeconds });
  }
}
