import { num } from '../../../shared/schemas/kit-number-fields';

/** What a version holds that a reader cares about, with the printer profile by name. */
export interface PresetSnapshot {
  name: string;
  description: string;
  tags: string[];
  printerProfileName: string | null;
  settings: Record<string, unknown>;
}

// Field words and units for the settings people change most; any other path falls back to its own name.
const LABELS: Record<string, [string, string]> = {
  joint: ['joint', ''],
  process: ['process', ''],
  material: ['material', ''],
  fit: ['fit', ''],
  clearance: ['clearance per side', 'mm'],
  calibrationOffset: ['calibration offset', 'mm'],
  format: ['STL format', ''],
  chordTolerance: ['chord tolerance', 'mm'],
  'key.shape': ['key shape', ''],
  'key.width': ['key width', 'mm'],
  'key.length': ['key length', 'mm'],
  'key.depth': ['key depth', 'mm'],
  'key.count': ['key count', ''],
  'key.margin': ['key margin', 'mm'],
  'key.chamfer': ['key chamfer', 'mm'],
  'key.strategy': ['key strategy', ''],
  'key.scale': ['key scale', ''],
  'key.endGap': ['key end gap', 'mm'],
  'key.bottomGap': ['pocket bottom gap', 'mm'],
  'key.entryChamfer': ['pocket entry chamfer', 'mm'],
  'key.flat': ['flat on a round key', 'mm'],
  'dovetail.rootWidth': ['dovetail root width', 'mm'],
  'dovetail.height': ['dovetail height', 'mm'],
  'dovetail.slope': ['dovetail slope 1:n', ''],
  'dovetail.angleDeg': ['dovetail angle', '°'],
  'dovetail.length': ['dovetail length', 'mm'],
  'dovetail.count': ['dovetail count', ''],
  'dovetail.pitch': ['dovetail pitch', 'mm'],
  'dovetail.endStop': ['dovetail end stop', ''],
  'dovetail.endStopWall': ['dovetail end stop wall', 'mm'],
  'dovetail.chamfer': ['dovetail chamfer', 'mm'],
  'dovetail.margin': ['dovetail margin', 'mm'],
};

function flatten(value: Record<string, unknown>, prefix = '', out = new Map<string, unknown>()) {
  for (const [key, v] of Object.entries(value)) {
    const path = prefix ? `${prefix}.${key}` : key;
    if (v !== null && typeof v === 'object' && !Array.isArray(v)) flatten(v as Record<string, unknown>, path, out);
    else out.set(path, v);
  }
  return out;
}

function words(value: unknown, unit: string): string {
  if (value === undefined || value === null) return 'not set';
  if (typeof value === 'boolean') return value ? 'on' : 'off';
  if (typeof value === 'number') return unit === '°' ? `${num(value)}°` : `${num(value)}${unit ? ` ${unit}` : ''}`;
  return typeof value === 'string' ? value : JSON.stringify(value);
}

function settingsChanges(before: Record<string, unknown>, after: Record<string, unknown>): string[] {
  const a = flatten(before);
  const b = flatten(after);
  // A new joint brings its own options; the old joint's options going away says nothing more.
  const oldJoint = before.joint !== after.joint ? String(before.joint) : null;
  const lines: string[] = [];
  for (const path of new Set([...a.keys(), ...b.keys()])) {
    if (oldJoint && path.startsWith(`${oldJoint}.`)) continue;
    const was = a.get(path);
    const now = b.get(path);
    if (JSON.stringify(was) === JSON.stringify(now)) continue;
    const [label, unit] = LABELS[path] ?? [path.replace(/\./g, ' '), ''];
    lines.push(`${label} ${words(was, unit)} → ${words(now, unit)}`);
  }
  return lines;
}

function tagChanges(before: string[], after: string[]): string[] {
  const added = after.filter((t) => !before.includes(t));
  const removed = before.filter((t) => !after.includes(t));
  const lines: string[] = [];
  if (added.length) lines.push(`tags added: ${added.join(', ')}`);
  if (removed.length) lines.push(`tags removed: ${removed.join(', ')}`);
  return lines;
}

/**
 * What changed between two versions of a preset, one plain line per change, e.g. `name "Helmet seam" →
 * "Helmet crown seam"`, `key width 10 mm → 12 mm`, `tags added: resin`. Empty when nothing changed.
 */
export function describeChanges(before: PresetSnapshot, after: PresetSnapshot): string[] {
  const lines: string[] = [];
  if (before.name !== after.name) lines.push(`name "${before.name}" → "${after.name}"`);
  if (before.description !== after.description) lines.push('description changed');
  lines.push(...tagChanges(before.tags, after.tags));
  if (before.printerProfileName !== after.printerProfileName) {
    const p = (n: string | null) => (n === null ? 'none' : `"${n}"`);
    lines.push(`printer profile ${p(before.printerProfileName)} → ${p(after.printerProfileName)}`);
  }
  lines.push(...settingsChanges(before.settings, after.settings));
  return lines;
}
