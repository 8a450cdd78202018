// Kit assembly: a resolved kit request in, STL files, README.txt and the manifest out. Pure.
export { buildKit, summarizeKit, type KitFile } from './build-kit';
export { kitManifestSchema, kitPartSchema, type KitManifest, type KitPart } from './kit-manifest';
export { KIT_FRAME } from './kit-frame';
