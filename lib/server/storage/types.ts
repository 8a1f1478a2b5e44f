/** Where document bytes live. The database keeps only the key, the type and the size. */
export interface StoredObject {
  body: ReadableStream<Uint8Array>;
  size?: number;
}

export interface DocumentStore {
  /** Writes the bytes under the key (keys are made by the caller: random, no user text). */
  put(key: string, bytes: Uint8Array, contentType: string): Promise<void>;
  /** The bytes as a stream, or null when nothing is stored under the key. */
  get(key: string): Promise<StoredObject | null>;
  delete(key: string): Promise<void>;
}
