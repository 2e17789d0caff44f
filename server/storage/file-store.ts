import { createReadStream } from 'node:fs';
import { mkdir, readdir, rename, rm, stat } from 'node:fs/promises';
import path from 'node:path';

/**
 * Every file the server keeps, addressed by a key relative to the uploads folder. The only module
 * that touches the disk for uploads, so object storage can take its place later.
 */
export class FileStore {
  constructor(readonly root: string) {}

  /** Absolute path of a key; refuses keys that would leave the root. */
  path(key: string): string {
    const resolved = path.resolve(this.root, key);
    if (resolved !== this.root && !resolved.startsWith(this.root + path.sep)) throw new Error(`Key outside the store: ${key}`);
    return resolved;
  }

  /** A folder for work in progress, under the store so that moving it into place is a rename. */
  async scratch(name: string): Promise<string> {
    const dir = this.path(path.join('.work', name));
    await rm(dir, { recursive: true, force: true });
    await mkdir(dir, { recursive: true });
    return dir;
  }

  get incoming(): string {
    return this.path('.incoming');
  }

  async ensure(): Promise<void> {
    await mkdir(this.incoming, { recursive: true });
    await mkdir(this.path('.work'), { recursive: true });
  }

  /** Moves a file or folder (absolute path) to a key, replacing nothing: the key must be new. */
  async moveIn(from: string, key: string): Promise<void> {
    const to = this.path(key);
    await mkdir(path.dirname(to), { recursive: true });
    await rename(from, to);
  }

  async remove(key: string): Promise<void> {
    await rm(this.path(key), { recursive: true, force: true });
  }

  async removePath(absolute: string): Promise<void> {
    await rm(absolute, { recursive: true, force: true });
  }

  async exists(key: string): Promise<boolean> {
    return stat(this.path(key)).then(
      () => true,
      () => false,
    );
  }

  read(key: string) {
    return createReadStream(this.path(key));
  }

  /** Number of files below a folder (tiles written so far). */
  async countFiles(absoluteDir: string): Promise<number> {
    const entries = await readdir(absoluteDir, { recursive: true, withFileTypes: true }).catch(() => []);
    return entries.filter((e) => e.isFile()).length;
  }

  /** Empties the work folders (after a restart nothing in them is still being written). */
  async clearScratch(): Promise<void> {
    await rm(this.path('.work'), { recursive: true, force: true });
    await rm(this.incoming, { recursive: true, force: true });
    await this.ensure();
  }
}
