import sharp from 'sharp';
import { PLAN_TILE_SIZE } from '../../shared/schemas/plans.js';

/**
 * Writes the tile pyramid of a plan image into `<outDir>/{z}/{y}/{x}.png`: 256-pixel tiles, the
 * full image at the highest zoom, halved at each level down to one tile. Blank tiles are kept so
 * that progress (files written / tiles to do) is exact.
 */
export async function buildPyramid(original: string, outDir: string): Promise<void> {
  await sharp(original, { limitInputPixels: false })
    .png({ compressionLevel: 6 })
    .tile({ size: PLAN_TILE_SIZE, layout: 'google', skipBlanks: -1 })
    .toFile(`${outDir}.dz`);
}
