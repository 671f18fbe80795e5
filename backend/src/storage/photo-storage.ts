/**
 * Where photos and overlays live. The local folder is the default; an S3-compatible store
 * implements the same three calls.
 */
export abstract class PhotoStorage {
  abstract put(key: string, bytes: Buffer): Promise<void>;
  /** The bytes, or undefined when nothing is stored under the key. */
  abstract get(key: string): Promise<Buffer | undefined>;
  abstract remove(key: string): Promise<void>;
}
