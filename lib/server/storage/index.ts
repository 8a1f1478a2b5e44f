import "server-only";
import { env } from "@/lib/env";
import { localStore } from "./local";
import { s3Store } from "./s3";
import type { DocumentStore } from "./types";

export type { DocumentStore, StoredObject } from "./types";

let store: DocumentStore | undefined;

/** The configured store: S3 when S3_BUCKET is set, otherwise files under UPLOAD_DIR. */
export function documentStore(): DocumentStore {
  store ??= env.S3_BUCKET
    ? s3Store({
        bucket: env.S3_BUCKET,
        region: env.S3_REGION,
        endpoint: env.S3_ENDPOINT,
        accessKeyId: env.S3_ACCESS_KEY_ID,
        secretAccessKey: env.S3_SECRET_ACCESS_KEY,
        forcePathStyle: env.S3_FORCE_PATH_STYLE,
        prefix: env.S3_PREFIX,
      })
    : localStore(env.UPLOAD_DIR);
  return store;
}
