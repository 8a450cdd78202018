import { describe, expect, it } from 'vitest';
import type { PrinterProfile, PrinterProfilePage } from '../../../../../shared/schemas/printer-profile';
import { withProfileEdit } from '../../../../../src/features/printer-profiles/lib/profile-edit';

const bench: PrinterProfile = {
  id: '7f1d2a3e-0000-4000-8000-000000000001',
  name: 'Bench printer',
  process: 'fdm',
  buildVolume: { x: 220, y: 220, z: 250 },
  nozzleDiameter: 0.4,
  layerHeight: 0.2,
  notes: '',
  calibration: [],
  createdAt: '2026-01-12T10:00:00.000Z',
  updatedAt: '2026-01-12T10:00:00.000Z',
  updatedBy: null,
};
const other: PrinterProfile = { ...bench, id: '7f1d2a3e-0000-4000-8000-000000000002', name: 'Loft printer' };
const page: PrinterProfilePage = { items: [bench, other], total: 2, page: 1, pageSize: 20 };
const { id: _id, createdAt: _c, updatedAt: _u, updatedBy: _b, ...input } = bench;
const entry = { material: 'PLA' as const, fit: 'snug' as const, offsetMm: 0.05, measuredOn: '2026-02-01' };

describe('withProfileEdit', () => {
  it('shows the edited fields in a list page when the profile is on it', () => {
    const edited = withProfileEdit(page, bench.id, { ...input, name: 'Renamed', calibration: [entry] });
    expect(edited.items[0]).toMatchObject({ id: bench.id, name: 'Renamed', createdAt: bench.createdAt });
    // The schema's defaults are applied, as the server will.
    expect(edited.items[0]!.calibration).toEqual([{ ...entry, source: 'entered by hand' }]);
    expect(edited.items[1]).toBe(other);
    expect(edited.total).toBe(2);
    expect(page.items[0]!.name).toBe('Bench printer');
  });

  it('edits the one-profile query of that profile and leaves another profile alone', () => {
    expect(withProfileEdit(bench, bench.id, { ...input, layerHeight: 0.12 }).layerHeight).toBe(0.12);
    expect(withProfileEdit(other, bench.id, { ...input, layerHeight: 0.12 })).toBe(other);
  });

  it('leaves the data unchanged when the body is refused by the schema or the data is something else', () => {
    expect(withProfileEdit(page, bench.id, { ...input, layerHeight: -1 })).toBe(page);
    const fitTests = { items: [{ id: 'x', printerProfileId: bench.id }] };
    expect(withProfileEdit(fitTests, bench.id, input)).toBe(fitTests);
    expect(withProfileEdit(undefined, bench.id, input)).toBeUndefined();
  });
});
