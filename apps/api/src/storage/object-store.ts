import { DeleteObjectCommand, GetObjectCommand, NoSuchKey, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import type { ObjectStoreConfig } from './storage.config';

/**
 * Object store — bytes by key in one bucket of an S3-compatible service (@aws-sdk/client-s3), shared by every
 * API instance. A PUT is atomic in S3: a reader sees the whole object or none.
 * Throws: the service's errors (S3ServiceException), except a missing key on get (null).
 */
export class ObjectStore {
  private readonly client: S3Client;

  constructor(private readonly config: ObjectStoreConfig) {
    // Friable runs on Node.js 20; the SDK version in the lock file supports it, so its notice about later
    // versions would only repeat at every start.
    process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';
    this.client = new S3Client({
      ...(config.endpoint ? { endpoint: config.endpoint } : {}),
      region: config.region,
      forcePathStyle: config.forcePathStyle,
      credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
      // Checksums only where the operation requires them: self-hosted stores differ in the newer trailers.
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
      maxAttempts: 3,
    });
  }

  async put(key: string, bytes: Buffer, contentType: string): Promise<void> {
    await this.client.send(new PutObjectCommand({ Bucket: this.config.bucket, Key: key, Body: bytes, ContentType: contentType }));
  }

  async get(key: string): Promise<Buffer | null> {
    try {
      const answer = await this.client.send(new GetObjectCommand({ Bucket: this.config.bucket, Key: key }));
      return answer.Body ? Buffer.from(await answer.Body.transformToByteArray()) : Buffer.alloc(0);
    } catch (error) {
      if (error instanceof NoSuchKey || (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404) return null;
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.config.bucket, Key: key }));
  }

  close(): void {
    this.client.destroy();
  }
}
