// Entry of a geometry worker thread (piscina). Plain JavaScript so that it loads the same way under
// `node --import tsx`, under vitest and in a bare worker: tsx's tsImport compiles the TypeScript tasks on
// the fly without registering a loader for the whole thread.
import { tsImport } from 'tsx/esm/api';

const tasks = await tsImport('./geometry-tasks.ts', import.meta.url);

export const kitZip = tasks.kitZip;
export const kitSummary = tasks.kitSummary;
export const couponZip = tasks.couponZip;
