// The stand-in's files on disk: <dir>/<appId>/<key> (the bytes) and <key>.json (what the service
// knows of it). Keys are checked against the service's alphabet, so no key names a path.
import { createHash } from "node:crypto";
import { mkdir, readdir, readFile, rm, writeFile } from "node:fs/promises";
import path from "node:path";

export type StoredFile = {
  key: string;
  customId: string | null;
  name: string;
  size: number;
  type: string;
  fileHash: string;
  uploadedAt: number;
  contentDisposition: string;
  acl: string | null;
};

const KEY = /^[A-Za-z0-9_-]{1,128}$/;
export const isKey = (key: string) => KEY.test(key);

export class FileStore {
  private files = new Map<string, StoredFile>();
  constructor(private dir: string) {}

  async load(): Promise<void> {
    await mkdir(this.dir, { recursive: true });
    for (const name of await readdir(this.dir)) {
      if (!name.endsWith(".json")) continue;
      const meta = JSON.parse(await readFile(path.join(this.dir, name), "utf8")) as StoredFile;
      if (isKey(meta.key)) this.files.set(meta.key, meta);
    }
  }

  async put(meta: Omit<StoredFile, "fileHash" | "uploadedAt" | "size">, bytes: Uint8Array): Promise<StoredFile> {
    if (!isKey(meta.key)) throw new Error("bad key");
    const file: StoredFile = { ...meta, size: bytes.length, fileHash: createHash("md5").update(bytes).digest("hex"), uploadedAt: Date.now() };
    await writeFile(path.join(this.dir, meta.key), bytes);
    await writeFile(path.join(this.dir, `${meta.key}.json`), JSON.stringify(file));
    this.files.set(file.key, file);
    return file;
  }

  get(key: string): StoredFile | undefined {
    return this.files.get(key);
  }

  byCustomId(customId: string): StoredFile | undefined {
    for (const f of this.files.values()) if (f.customId === customId) return f;
    return undefined;
  }

  async bytes(key: string): Promise<Buffer | null> {
    if (!this.files.has(key)) return null;
    return readFile(path.join(this.dir, key)).catch(() => null);
  }

  async delete(key: string): Promise<boolean> {
    if (!this.files.delete(key)) return false;
    await rm(path.join(this.dir, key), { force: true });
    await rm(path.join(this.dir, `${key}.json`), { force: true });
    return true;
  }

  /** Oldest first, as the service lists them. */
  list(): StoredFile[] {
    return [...this.files.values()].sort((a, b) => a.uploadedAt - b.uploadedAt);
  }
}
