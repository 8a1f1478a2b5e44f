import "server-only";
import { createReadStream } from "node:fs";
import { mkdir, rm, stat, writeFile } from "node:fs/promises";
import { dirname, resolve, sep } from "node:path";
import { Readable } from "node:stream";
import { checkStorageKey } from "./keys";
import type { DocumentStore } from "./types";

/** Files under one folder (development, the demo, tests). A key never leaves the folder. */
export function localStore(root: string): DocumentStore {
  const base = resolve(root);
  const pathOf = (key: string) => {
    const path = resolve(base, checkStorageKey(key));
    if (!path.startsWith(base + sep)) throw new Error("Invalid storage key.");
    return path;
  };
  return {
    async put(key, bytes) {
      const path = pathOf(key);
      await mkdir(dirname(path), { recursive: true });
      await writeFile(path, bytes, { flag: "wx" });
    },
    async get(key) {
      const path = pathOf(key);
      try {
        const info = await stat(path);
        return { body: Readable.toWeb(createReadStream(path)) as ReadableStream<Uint8Array>, size: info.size };
      } catch {
        return null;
      }
    },
    async delete(key) {
      await rm(pathOf(key), { force: true });
    },
  };
}
