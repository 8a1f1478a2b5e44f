import "server-only";
import { DeleteObjectCommand, GetObjectCommand, NoSuchKey, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
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
  });
  const keyOf = (key: string) => `${settings.prefix}${key}`;
  return {
    async put(key, bytes, contentType) {
      await client.send(new PutObjectCommand({ Bucket: settings.bucket, Key: keyOf(key), Body: bytes, ContentType: contentType }));
    },
    async get(key) {
      try {
        const object = await client.send(new GetObjectCommand({ Bucket: settings.bucket, Key: keyOf(key) }));
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
