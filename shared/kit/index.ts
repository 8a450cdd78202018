// Kit assembly: a resolved kit request in, STL files, README.txt and the manifest out. Pure.
export { buildKit, meshKit, summarizeKit, type KitFile } from './build-kit';
export { kitManifestSchema, kitPartSchema, type KitManifest, type KitPart } from './kit-manifest';
export { keyKitPlan } from './key-kit-plan';
export { dovetailKitPlan } from './dovetail-kit-plan';
export type { KitPlan, KitPartPlan } from './kit-part-plan';
export { KIT_FRAME } from './kit-frame';
export { kitCautions } from './kit-cautions';
