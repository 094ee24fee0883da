import { createHash } from 'node:crypto';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { linkPacketTemplateData } from './link-packet';
import { buildFirmwareModel, type FirmwareModel } from './model/firmware-model';
import { buildRemoteModel, type RemoteModel } from './model/remote-model';
import { buildReadmeModel } from './readme-model';
import { remoteFolderName, sketchFolderName } from './sketch-name';
import { renderTemplate } from './templates';

export interface BundleFile {
  /** Path inside the bundle, with forward slashes: `greenhouse_cart/greenhouse_cart.ino`. */
  path: string;
  content: string;
}

export interface RenderOptions {
  revision: number;
}

/** Headers every robot sketch gets, in include order (template under common/ unless noted). */
const ROBOT_HEADERS = [
  'mw_config.h',
  'mw_frame.h',
  'mw_mixer.h',
  'mw_safety.h',
  'mw_input.h',
  'mw_outputs.h',
  'mw_console.h',
  'mw_status.h',
];

function robotFiles(folder: string, model: FirmwareModel, data: object): BundleFile[] {
  const headers = [...ROBOT_HEADERS];
  if (model.input.isNrf24) headers.push('mw_nrf24.h', 'mw_link_packet.h');
  else headers.push(model.input.decoderHeader);
  const files = [
    { path: `${folder}/${folder}.ino`, content: renderTemplate('common/sketch.ino', data) },
    { path: `${folder}/mw_platform.h`, content: renderTemplate(`${model.board.family}/mw_platform.h`, data) },
    ...headers.map((h) => ({ path: `${folder}/${h}`, content: renderTemplate(`common/${h}`, data) })),
    ...model.driverHeaders.map((h) => ({
      path: `${folder}/${h}`,
      content: renderTemplate(`common/drivers/${h}`, data),
    })),
  ];
  return files;
}

function remoteFiles(folder: string, data: object): BundleFile[] {
  return [
    { path: `${folder}/${folder}.ino`, content: renderTemplate('remote/remote.ino', data) },
    { path: `${folder}/mw_remote_config.h`, content: renderTemplate('remote/mw_remote_config.h', data) },
    ...['mw_frame.h', 'mw_nrf24.h', 'mw_link_packet.h'].map((h) => ({
      path: `${folder}/${h}`,
      content: renderTemplate(`common/${h}`, data),
    })),
  ];
}

export function sha256(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

function manifest(config: RobotConfig, model: FirmwareModel, folder: string, files: BundleFile[]): string {
  const body = {
    generator: 'Mixwright firmware generator',
    generatorVersion: model.meta.generatorVersion,
    robot: config.name,
    revision: model.meta.revision,
    configHash: model.meta.hash,
    board: model.board.id,
    input: model.input.source,
    sketch: folder,
    files: files.map((f) => ({ path: f.path, bytes: Buffer.byteLength(f.content, 'utf8'), sha256: sha256(f.content) })),
  };
  return `${JSON.stringify(body, null, 2)}\n`;
}

/**
 * The firmware bundle for a configuration: the robot's sketch folder, the remote's for a
 * home-made link, README.md, config.json (the exact configuration) and manifest.json.
 * Throws FirmwareConfigError naming every field that prevents generation.
 */
export function renderBundle(config: RobotConfig, options: RenderOptions): BundleFile[] {
  if (!Number.isInteger(options.revision) || options.revision < 0)
    throw new Error('revision must be a whole number, 0 or more');
  const model = buildFirmwareModel(config, options.revision);
  const folder = sketchFolderName(config.name, config.firmware.sketchName);
  const remoteFolder = remoteFolderName(folder);
  const remote: RemoteModel | null = model.input.isNrf24 ? buildRemoteModel(config, model) : null;
  const packet = linkPacketTemplateData();
  const data = { ...model, packet, remote };
  const code = [...robotFiles(folder, model, data), ...(remote ? remoteFiles(remoteFolder, data) : [])];
  const configJson = { path: 'config.json', content: `${JSON.stringify(config, null, 2)}\n` };
  const readme = buildReadmeModel(config, model, remote, folder, remoteFolder, [...code, configJson]);
  const readmeFile = { path: 'README.md', content: renderTemplate('docs/README.md', { ...data, readme }) };
  const files = [...code, readmeFile, configJson];
  return [...files, { path: 'manifest.json', content: manifest(config, model, folder, files) }];
}
