import { createHash } from 'node:crypto';
import { createReadStream, createWriteStream } from 'node:fs';
import { mkdir, readdir, rm } from 'node:fs/promises';
import path from 'node:path';
import { Transform } from 'node:stream';
import { pipeline } from 'node:stream/promises';

/** Copies a file to a new path and returns the SHA-256 and size of the bytes written, in one pass. */
export async function copyWithHash(from: string, to: string): Promise<{ size: number; sha256: string }> {
  await mkdir(path.dirname(to), { recursive: true });
  const hash = createHash('sha256');
  let size = 0;
  const tap = new Transform({
    transform(chunk: Buffer, _encoding, done) {
      hash.update(chunk);
      size += chunk.length;
      done(null, chunk);
    },
  });
  try {
    await pipeline(createReadStream(from), tap, createWriteStream(to, { flags: 'wx' }));
  } catch (err) {
    await rm(to, { force: true });
    throw err;
  }
  return { size, sha256: hash.digest('hex') };
}

/**
 * Every file below `root` as a relative path with `/` separators. Top-level entries whose name
 * starts with a dot are work in progress (`.incoming`, `.work`, a restore's set-aside folder) and
 * are left out, as are links.
 */
export async function listFiles(root: string): Promise<string[]> {
  const files: string[] = [];
  async function walk(dir: string, prefix: string, top: boolean) {
    const entries = await readdir(dir, { withFileTypes: true }).catch((err: NodeJS.ErrnoException) => {
      if (err.code === 'ENOENT') return []; // removed while we walked
      throw err;
    });
    for (const entry of entries) {
      if (top && entry.name.startsWith('.')) continue;
      const relative = prefix ? `${prefix}/${entry.name}` : entry.name;
      if (entry.isDirectory()) await walk(path.join(dir, entry.name), relative, false);
      else if (entry.isFile()) files.push(relative);
    }
  }
  await walk(root, '', true);
  return files.sort();
}
