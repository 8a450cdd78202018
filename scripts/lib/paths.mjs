// Where the project keeps its local state. Everything here is git-ignored.
import { fileURLToPath } from 'node:url';
import path from 'node:path';

export const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
export const dataDir = path.join(root, '.data');
export const lockFile = path.join(root, 'package-lock.json');
export const nodeModules = path.join(root, 'node_modules');
