import path from 'node:path';
import exifr from 'exifr';
import sharp from 'sharp';
import { DERIVATIVE_SIZES, DERIVATIVES, type DerivativeName } from '../../shared/schemas/media.js';

export interface PhotoFacts {
  /** Upright size, after the EXIF orientation is applied. */
  width: number;
  height: number;
  /** Date and time taken as the camera wrote it, `YYYY-MM-DDTHH:MM:SS`, or null. */
  takenAt: string | null;
}

export function derivativeFile(dir: string, name: DerivativeName): string {
  return path.join(dir, `${name}.webp`);
}

/** EXIF `YYYY:MM:DD HH:MM:SS` as `YYYY-MM-DDTHH:MM:SS`; null when absent or malformed. */
export function exifDateTime(value: unknown): string | null {
  if (typeof value !== 'string') return null;
  const m = /^(\d{4}):(\d{2}):(\d{2})[ T](\d{2}):(\d{2}):(\d{2})/.exec(value.trim());
  if (!m || m[1] === '0000') return null;
  return `${m[1]}-${m[2]}-${m[3]}T${m[4]}:${m[5]}:${m[6]}`;
}

async function dateTaken(file: string): Promise<string | null> {
  const tags = (await exifr.parse(file, { pick: ['DateTimeOriginal', 'CreateDate'], reviveValues: false }).catch(() => null)) as Record<string, unknown> | null;
  return exifDateTime(tags?.DateTimeOriginal) ?? exifDateTime(tags?.CreateDate);
}

/**
 * Makes a photo's WebP derivatives in `dir`: turned upright by its EXIF orientation and written
 * without any metadata (sharp keeps none unless asked), so no GPS position or camera serial
 * leaves with them. Throws when the image cannot be decoded.
 */
export async function makeDerivatives(original: string, dir: string): Promise<PhotoFacts> {
  const upright = sharp(original, { failOn: 'error' }).rotate();
  const outputs = await Promise.all(
    DERIVATIVES.map((name) =>
      upright
        .clone()
        .resize({ width: DERIVATIVE_SIZES[name], height: DERIVATIVE_SIZES[name], fit: 'inside', withoutEnlargement: true })
        .webp({ quality: name === 'thumb' ? 72 : 82 })
        .toFile(derivativeFile(dir, name)),
    ),
  );
  const meta = await sharp(original).metadata();
  const turned = (meta.orientation ?? 1) >= 5;
  const width = turned ? meta.height : meta.width;
  const height = turned ? meta.width : meta.height;
  if (!width || !height || outputs.length !== DERIVATIVES.length) throw new Error('The image has no size.');
  return { width, height, takenAt: await dateTaken(original) };
}
