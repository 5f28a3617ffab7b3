import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import { AppConfig } from '../config/app-config.js';
import { ApiException } from '../common/errors/api-exception.js';
import { startLocalS3, type LocalS3 } from './local-s3.js';
import { loadStorageSettings, type StorageSettings } from './storage-settings.js';

/** 503 for any storage failure that is not the caller's fault (endpoint down, timeout, 5xx). */
export const storageUnavailable = () =>
  new ApiException(503, 'service_unavailable', 'File storage is not reachable. Try again later.');

/**
 * Attachments' bytes in an S3-compatible bucket. Starts the embedded fake when S3_EMBEDDED=1.
 * Every failure to reach the storage becomes a 503 `service_unavailable`.
 */
@Injectable()
export class ObjectStorage implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('ObjectStorage');
  readonly settings: StorageSettings;
  private client!: S3Client;
  private local?: LocalS3;
  private endpoint = '';

  constructor(config: AppConfig) {
    this.settings = loadStorageSettings(config.settings.DATA_DIR);
  }

  async onModuleInit(): Promise<void> {
    const s = this.settings;
    if (s.S3_EMBEDDED) {
      this.local = await startLocalS3({
        directory: s.directory,
        bucket: s.S3_BUCKET,
        port: s.S3_PORT,
      });
      this.endpoint = this.local.endpoint;
      this.logger.log(
        `embedded object storage (s3rver) at ${this.endpoint}, bucket ${s.S3_BUCKET}`,
      );
    } else {
      this.endpoint = s.S3_ENDPOINT ?? 'http://127.0.0.1:4569';
    }
    // Holdfast runs on Node 20 by design; the SDK's notice that later SDK releases will want
    // Node 22 says nothing about this pinned version and would print on every start and test.
    process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';
    this.client = new S3Client({
      endpoint: this.endpoint,
      region: s.S3_REGION,
      forcePathStyle: true,
      credentials: { accessKeyId: s.S3_ACCESS_KEY, secretAccessKey: s.S3_SECRET_KEY },
      maxAttempts: 2,
      requestHandler: { requestTimeout: s.S3_TIMEOUT_MS, connectionTimeout: s.S3_TIMEOUT_MS },
    });
    await this.ensureBucket().catch((e: unknown) =>
      this.logger.warn(
        `object storage not reachable at start (${describe(e)}); uploads answer 503 until it is`,
      ),
    );
  }

  async onModuleDestroy(): Promise<void> {
    this.client?.destroy();
    await this.local?.close();
  }

  private async ensureBucket(): Promise<void> {
    const Bucket = this.settings.S3_BUCKET;
    try {
      await this.client.send(new HeadBucketCommand({ Bucket }), this.deadline());
    } catch (e) {
      if (httpStatus(e) !== 404) throw e;
      await this.client.send(new CreateBucketCommand({ Bucket }), this.deadline());
    }
  }

  /**
   * A deadline for one whole operation, retries included. The SDK's socket timeouts do not end a
   * request to storage that accepts the connection and never answers (the fault test saw an
   * upload wait past 30 s), so each call is also aborted after two attempts' worth of
   * S3_TIMEOUT_MS, plus a second per MiB sent (a floor of 1 MiB/s for large uploads).
   */
  private deadline(bytes = 0) {
    const ms = 2 * this.settings.S3_TIMEOUT_MS + Math.ceil(bytes / 1048576) * 1000;
    return { abortSignal: AbortSignal.timeout(ms) };
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    try {
      await this.client.send(
        new PutObjectCommand({
          Bucket: this.settings.S3_BUCKET,
          Key: key,
          Body: body,
          ContentType: contentType,
        }),
        this.deadline(body.length),
      );
    } catch (e) {
      if (httpStatus(e) === 404) {
        await this.ensureBucket().catch(() => undefined);
      }
      this.logger.error(`put ${key} failed: ${describe(e)}`);
      throw storageUnavailable();
    }
  }

  /** The object's bytes, or undefined when it does not exist. */
  async get(key: string): Promise<Buffer | undefined> {
    try {
      const out = await this.client.send(
        new GetObjectCommand({ Bucket: this.settings.S3_BUCKET, Key: key }),
        this.deadline(),
      );
      const bytes = await out.Body?.transformToByteArray();
      return bytes ? Buffer.from(bytes) : Buffer.alloc(0);
    } catch (e) {
      if (httpStatus(e) === 404) return undefined;
      this.logger.error(`get ${key} failed: ${describe(e)}`);
      throw storageUnavailable();
    }
  }

  /** Best effort: used to undo an upload whose database row could not be written. */
  async delete(key: string): Promise<void> {
    try {
      await this.client.send(
        new DeleteObjectCommand({ Bucket: this.settings.S3_BUCKET, Key: key }),
        this.deadline(),
      );
    } catch (e) {
      this.logger.error(`delete ${key} failed, object left orphaned: ${describe(e)}`);
    }
  }
}

function httpStatus(e: unknown): number | undefined {
  return (e as { $metadata?: { httpStatusCode?: number } })?.$metadata?.httpStatusCode;
}

function describe(e: unknown): string {
  return e instanceof Error ? `${e.name}: ${e.message}` : String(e);
}
