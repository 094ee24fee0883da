import JSZip from 'jszip';
import { snakeWords } from './c-text';
import type { BundleFile } from './render-bundle';

// Every entry carries the same date, so the same bundle always zips to the same bytes
// (1 January 1980, the earliest date the zip format stores).
const FIXED_DATE = new Date(Date.UTC(1980, 0, 1, 0, 0, 0));

/** The bundle as a zip archive, entries in the bundle's order, deflated. */
export async function zipBundle(files: BundleFile[]): Promise<Buffer> {
  const zip = new JSZip();
  for (const file of files) zip.file(file.path, file.content, { date: FIXED_DATE, createFolders: false });
  return zip.generateAsync({
    type: 'nodebuffer',
    compression: 'DEFLATE',
    compressionOptions: { level: 9 },
    platform: 'UNIX',
  });
}

/**
 * The download's file name: the robot's name as a slug and the revision, e.g.
 * `greenhouse-cart-r7.zip` (ASCII only, so it survives every browser and file system).
 */
export function bundleFileName(robotName: string, revision: number): string {
  const slug = snakeWords(robotName).replace(/_/g, '-').slice(0, 60).replace(/-+$/, '') || 'robot';
  return `${slug}-r${revision}.zip`;
}
