import "server-only";
import { DeleteObjectCommand, GetObjectCommand, NoSuchKey, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { checkStorageKey } from "./keys";
import type { DocumentStore } from "./types";

export interface S3Settings {
  bucket: string;
  region: string;
  endpoint?: string;
  accessKeyId?: string;
  secretAccessKey?: string;
  forcePathStyle: boolean;
  prefix: string;
}

/** An S3 bucket (or an S3-compatible store). Objects are private; downloads stream through the app. */
export function s3Store(settings: S3Settings): DocumentStore {
  const client = new S3Client({
    region: settings.region,
    endpoint: settings.endpoint,
    forcePathStyle: settings.forcePathStyle,
    credentials:
      settings.accessKeyId && settings.secretAccessKey
        ? { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey }
        : undefined,
    // Checksums only where an operation requires them. This SDK's default adds a CRC32 checksum to every
    // upload, and sends a streamed body as aws-chunked with the checksum in a trailer, which S3-compatible
    // stores do not all accept: the test fake (s3rver) refuses the streamed form with "x-amz-content-sha256
    // must be UNSIGNED-PAYLOAD, STREAMING-AWS4-HMAC-SHA256-PAYLOAD, or a valid sha256 value"; older stores
    // refuse the checksum headers themselves (from memory). Real S3 takes either. The request stays
    // SigV4-signed over the body's SHA-256, so the bytes are still checked on the way in; a download is
    // checked only when asked for, since many stores send no checksum back.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  // The prefix is a folder: "documents" keeps keys under "documents/", never beside it in "documents-old/".
  const prefix = settings.prefix && !settings.prefix.endsWith("/") ? `${settings.prefix}/` : settings.prefix;
  // The same key rule as the folder driver: a store may resolve "..", so such a key is refused, not sent.
  const keyOf = (key: string) => `${prefix}${checkStorageKey(key)}`;
  return {
    async put(key, bytes, contentType) {
      await client.send(new PutObjectCommand({ Bucket: settings.bucket, Key: keyOf(key), Body: bytes, ContentType: contentType }));
    },
    async get(key) {
      const objectKey = keyOf(key);
      try {
        const object = await client.send(new GetObjectCommand({ Bucket: settings.bucket, Key: objectKey }));
        if (!object.Body) return null;
        return { body: object.Body.transformToWebStream() as ReadableStream<Uint8Array>, size: object.ContentLength };
      } catch (error) {
        if (error instanceof NoSuchKey) return null;
        throw error;
      }
    },
    async delete(key) {
      await client.send(new DeleteObjectCommand({ Bucket: settings.bucket, Key: keyOf(key) }));
    },
  };
}
