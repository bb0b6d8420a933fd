import "server-only";
import {
  DeleteObjectCommand,
  GetObjectCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from "@aws-sdk/client-s3";
import { AppError } from "@/lib/errors";
import { checkStorageKey, type FileStore } from "./file-store";

export type S3Settings = {
  bucket: string;
  region: string;
  /** Omitted for AWS itself; set for any other S3-compatible service. */
  endpoint?: string;
  /** Omitted to use the SDK's usual credential chain (instance role, AWS_* variables, profile). */
  credentials?: { accessKeyId: string; secretAccessKey: string };
  /** Most self-hosted services (and the test stand-in) want bucket-in-path addresses. */
  forcePathStyle?: boolean;
  /** Key prefix, so several deployments can share one bucket. */
  prefix?: string;
};

// A store that does not answer fails the request quickly with a 503 rather than holding it open.
const CONNECT_TIMEOUT_MS = 3_000;
const REQUEST_TIMEOUT_MS = 20_000;

const unavailable = () =>
  new AppError("unavailable", "The file store is not answering just now. Try again in a moment.", {
    retryAfterSeconds: 5,
  });

const isMissing = (err: unknown) =>
  err instanceof S3ServiceException && (err.name === "NoSuchKey" || err.$metadata.httpStatusCode === 404);

/** An answer from the service (wrong bucket, refused keys) is a server fault; no answer at all is a 503. */
function storeFailure(err: unknown): unknown {
  if (err instanceof S3ServiceException && err.$metadata.httpStatusCode && err.$metadata.httpStatusCode < 500)
    return err;
  return unavailable();
}

/** Uploads in an S3-compatible bucket, so every app server reads what any of them wrote. */
export class S3Store implements FileStore {
  readonly description: string;
  private readonly client: S3Client;

  constructor(private readonly settings: S3Settings) {
    this.description = `S3 bucket ${settings.bucket}${settings.endpoint ? ` at ${settings.endpoint}` : ""}`;
    this.client = new S3Client({
      region: settings.region,
      endpoint: settings.endpoint,
      forcePathStyle: settings.forcePathStyle,
      credentials: settings.credentials,
      maxAttempts: 3,
      requestHandler: { connectionTimeout: CONNECT_TIMEOUT_MS, requestTimeout: REQUEST_TIMEOUT_MS },
    });
  }

  private objectKey(key: string) {
    return `${this.settings.prefix ?? ""}${checkStorageKey(key)}`;
  }

  async put(key: string, bytes: Uint8Array, contentType: string) {
    const command = new PutObjectCommand({
      Bucket: this.settings.bucket,
      Key: this.objectKey(key),
      Body: bytes,
      ContentType: contentType,
      ContentLength: bytes.byteLength,
    });
    try {
      await this.client.send(command);
    } catch (err) {
      throw storeFailure(err);
    }
  }

  async get(key: string) {
    const command = new GetObjectCommand({ Bucket: this.settings.bucket, Key: this.objectKey(key) });
    try {
      const out = await this.client.send(command);
      return out.Body ? await out.Body.transformToByteArray() : new Uint8Array();
    } catch (err) {
      if (isMissing(err)) return null;
      throw storeFailure(err);
    }
  }

  async delete(key: string) {
    // S3 answers a delete of a missing key with success too, so a retried delete is harmless.
    const command = new DeleteObjectCommand({ Bucket: this.settings.bucket, Key: this.objectKey(key) });
    try {
      await this.client.send(command);
    } catch (err) {
      if (isMissing(err)) return;
      throw storeFailure(err);
    }
  }
}
