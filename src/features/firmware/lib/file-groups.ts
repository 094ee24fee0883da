import type { FirmwareFile, FirmwareFiles } from '@shared/schemas/firmware';

export interface FileGroup {
  id: 'robot' | 'remote' | 'documents';
  title: string;
  /** The sketch folder the group's files sit in; null for the bundle's top-level documents. */
  folder: string | null;
  files: FirmwareFile[];
}

/** The file's name inside its folder. */
export function fileName(path: string): string {
  return path.slice(path.lastIndexOf('/') + 1);
}

/**
 * The bundle as a tree one folder deep: the robot's sketch, the handheld remote's transmitter
 * sketch (home-made link only) and the documents beside them. Files keep the bundle's order,
 * which puts each sketch's .ino first and its headers in include order.
 */
export function groupFiles(bundle: FirmwareFiles): FileGroup[] {
  const inFolder = (folder: string) => bundle.files.filter((f) => f.path.startsWith(`${folder}/`));
  const groups: FileGroup[] = [
    { id: 'robot', title: 'Robot sketch', folder: bundle.sketchFolder, files: inFolder(bundle.sketchFolder) },
  ];
  if (bundle.remoteFolder) {
    groups.push({
      id: 'remote',
      title: 'Remote transmitter sketch',
      folder: bundle.remoteFolder,
      files: inFolder(bundle.remoteFolder),
    });
  }
  groups.push({
    id: 'documents',
    title: 'Bundle documents',
    folder: null,
    files: bundle.files.filter((f) => !f.path.includes('/')),
  });
  return groups.filter((g) => g.files.length > 0);
}

/** The file to show first: the one asked for when the bundle still has it, else the robot's sketch. */
export function pickFile(bundle: FirmwareFiles, wanted: string | null): FirmwareFile | null {
  return (
    bundle.files.find((f) => f.path === wanted) ??
    bundle.files.find((f) => f.path === `${bundle.sketchFolder}/${bundle.sketchFolder}.ino`) ??
    bundle.files[0] ??
    null
  );
}

/** "1.2 kB", "845 B": sizes in the tree. */
export function formatBytes(bytes: number): string {
  return bytes < 1000 ? `${bytes} B` : `${(bytes / 1000).toFixed(1)} kB`;
}
