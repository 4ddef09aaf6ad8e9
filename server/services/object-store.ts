/**
 * The Storage of uploads over S3 (@aws-sdk/client-s3, pinned: releases after early 2027 need
 * Node 22). Path-style addressing, so the same client talks to AWS, MinIO or the s3rver fake
 * that main.ts starts in development (object-store-fake.ts).
 */
import {
  CreateBucketCommand, DeleteObjectCommand, GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client, S3ServiceException,
} from '@aws-sdk/client-s3';
import type { StorageSettings } from '../config';
import type { Storage } from './storage';

/** Thrown by `get` for a key the bucket does not hold. */
export class ObjectNotFound extends Error {
  override readonly name = 'ObjectNotFound';
}

const statusOf = (e: unknown) => (e instanceof S3ServiceException ? e.$metadata.httpStatusCode : undefined);

export class ObjectStore implements Storage {
  private readonly client: S3Client;

  constructor(private readonly settings: StorageSettings & { endpoint: string }) {
    const { accessKey, secretKey } = settings;
    this.client = new S3Client({
      endpoint: settings.endpoint,
      region: settings.region,
      forcePathStyle: true,
      ...(accessKey && secretKey ? { credentials: { accessKeyId: accessKey, secretAccessKey: secretKey } } : {}),
      maxAttempts: 3,
    });
  }

  get bucket(): string {
    return this.settings.bucket;
  }

  /** Create the bucket when it does not exist (the fake starts empty; a real one usually exists). */
  async ensureBucket(): Promise<void> {
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.bucket }));
    } catch (e) {
      if (statusOf(e) !== 404) throw e;
      await this.client.send(new CreateBucketCommand({ Bucket: this.bucket }));
    }
  }

  async put(key: string, data: Buffer, contentType: string): Promise<void> {
    await this.client.send(new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: data, ContentType: contentType, ContentLength: data.length }));
  }

  async get(key: string): Promise<Buffer> {
    try {
      const out = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
      return Buffer.from(await out.Body!.transformToByteArray());
    } catch (e) {
      if (statusOf(e) === 404) throw new ObjectNotFound(`no object ${key} in bucket ${this.bucket}`);
      throw e;
    }
  }

  /** Deleting a key that does not exist is not an error (S3 semantics). */
  async remove(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key }));
  }

  /** Close the client's sockets. */
  close(): void {
    this.client.destroy();
  }
}
