// The invented studio's library: two printers, a few presets that read like a prop shop's, one team
// material per process and a short kit history. Every name is made up; no real brand or product is meant.
import type { PresetInput } from '../../../shared/schemas/preset';
import type { PrinterProfileInput } from '../../../shared/schemas/printer-profile';
import type { TeamMaterialInput } from '../../../shared/schemas/material';
import type { Face } from '../../../shared/schemas/face';

export const demoPrinters: PrinterProfileInput[] = [
  {
    name: 'Big bench FDM',
    process: 'fdm',
    buildVolume: { x: 300, y: 300, z: 350 },
    nozzleDiameter: 0.6,
    layerHeight: 0.24,
    notes: 'The large-format printer by the window. 0.6 mm hardened nozzle for armour and bases.',
    calibration: [
      { material: 'PLA', fit: 'snug', offsetMm: -0.03, measuredOn: '2026-01-12', source: 'fit test coupon, 5 sizes' },
      { material: 'PLA', fit: 'press', offsetMm: -0.02, measuredOn: '2026-01-12', source: 'fit test coupon, 5 sizes' },
      { material: 'PETG', fit: 'slide', offsetMm: 0.04, measuredOn: '2026-02-03', source: 'entered by hand' },
    ],
  },
  {
    name: 'Detail resin vat',
    process: 'resin',
    buildVolume: { x: 192, y: 120, z: 200 },
    layerHeight: 0.05,
    notes: 'For visors, hinges and small trim. Wash 6 min, cure 4 min per side.',
    calibration: [
      { material: 'resin-standard', fit: 'snug', offsetMm: 0.02, measuredOn: '2026-01-20', source: 'entered by hand' },
    ],
  },
];

/** Presets with the printer they belong to (by name), and optional later edits that make version 2, 3… */
export const demoPresets: {
  preset: Omit<PresetInput, 'printerProfileId'>;
  printer: string | null;
  edits?: Partial<PresetInput>[];
  archived?: boolean;
}[] = [
  {
    preset: {
      name: 'Helmet crown seam',
      description: 'Where the crown meets the brow band on the full helmets. Glued, sanded flush.',
      tags: ['helmet', 'glued'],
      settings: { joint: 'key', material: 'PLA', fit: 'snug', key: { shape: 'square', width: 10, depth: 8, count: 6 } },
    },
    printer: 'Big bench FDM',
    edits: [
      {
        settings: {
          joint: 'key',
          material: 'PLA',
          fit: 'snug',
          key: { shape: 'square', width: 12, depth: 8, count: 6 },
          // The studio's own white PLA (a team material below) prints a touch fat.
          materialTuning: { name: 'Bone-white PLA', clearanceAdjustment: 0.01 },
        },
      },
    ],
  },
  {
    preset: {
      name: 'Display base plinth',
      description: 'Two-part plinth for busts; the top slides on so it can come off for transport.',
      tags: ['base', 'removable'],
      settings: {
        joint: 'dovetail',
        material: 'PETG',
        fit: 'slide',
        dovetail: { rootWidth: 14, height: 6, slope: 6, count: 2, endStop: true },
      },
    },
    printer: 'Big bench FDM',
  },
  {
    preset: {
      name: 'Long wing spar',
      description:
        'Wing spars longer than the bed, cut in three; round keys so the halves cannot twist out of line when glued.',
      tags: ['wing', 'long part'],
      settings: { joint: 'key', material: 'PLA', fit: 'press', key: { shape: 'round', width: 8, depth: 10, count: 3 } },
    },
    printer: 'Big bench FDM',
  },
  {
    preset: {
      name: 'Visor hinge pins',
      description: 'Small hex keys for the resin visor halves.',
      tags: ['helmet', 'resin', 'small parts'],
      settings: {
        joint: 'key',
        material: 'resin-standard',
        fit: 'snug',
        key: { shape: 'hex', width: 4, depth: 4, count: 2 },
      },
    },
    printer: 'Detail resin vat',
  },
  {
    preset: {
      name: 'Shield boss (old)',
      description: 'Replaced by the helmet crown seam settings.',
      tags: ['shield'],
      settings: {
        joint: 'key',
        material: 'PETG',
        fit: 'snug',
        key: { shape: 'rect', width: 12, length: 6, depth: 6, count: 4 },
      },
    },
    printer: null,
    archived: true,
  },
];

export const demoMaterials: TeamMaterialInput[] = [
  {
    name: 'Bone-white PLA',
    baseMaterial: 'PLA',
    shrinkagePercent: 0.25,
    clearanceAdjustments: { snug: 0.01 },
    notes: 'The matte white the studio primes over.',
  },
  { name: 'Stone-grey tough resin', baseMaterial: 'resin-tough', notes: 'For parts that get handled on stage.' },
];

/** Kits the studio downloaded: which preset, the cut face, and how many days ago. */
export const demoKits: { preset: string; face: Face; daysAgo: number; by: 'owner' | 'editor' }[] = [
  { preset: 'Helmet crown seam', face: { shape: 'circle', diameter: 180 }, daysAgo: 9, by: 'editor' },
  { preset: 'Display base plinth', face: { shape: 'rect', width: 160, height: 120 }, daysAgo: 4, by: 'owner' },
  { preset: 'Long wing spar', face: { shape: 'rect', width: 40, height: 24 }, daysAgo: 1, by: 'editor' },
];
