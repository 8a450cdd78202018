import { describe, expect, it } from 'vitest';
import { summarizeKit } from '../../../../../shared/kit/build-kit';
import { kitRequestSchema } from '../../../../../shared/schemas/kit-request';
import { previewKit } from '../../../../../src/features/design/lib/preview-kit';

const keyRequest = kitRequestSchema.parse({
  joint: 'key',
  material: 'PLA',
  fit: 'snug',
  face: { shape: 'rect', width: 80, height: 60 },
  key: { shape: 'square', width: 10, depth: 8, count: 8 },
});
const dovetailRequest = kitRequestSchema.parse({
  joint: 'dovetail',
  material: 'PETG',
  fit: 'slide',
  face: { shape: 'rect', width: 90, height: 60 },
  dovetail: { rootWidth: 10, height: 6, count: 3 },
});

describe('previewKit', () => {
  it('gives the same manifest as the server when the request is a key kit', () => {
    const kit = previewKit(keyRequest);
    expect(kit.manifest).toEqual(summarizeKit(keyRequest));
    expect(kit.meshes.map((m) => m.positions.length / 9)).toEqual(kit.manifest.parts.map((p) => p.triangles));
  });

  it('stands the printed key back up across the cut face when the joint is keys', () => {
    const key = previewKit(keyRequest).keyInPlace!;
    const axis = (i: number) => key.positions.filter((_, j) => j % 3 === i);
    // A 10 mm square key 15.6 mm long (2 × 8 mm depth − 0.4 mm end gap), centred on the origin.
    expect(Math.min(...axis(0))).toBeCloseTo(-5, 4);
    expect(Math.max(...axis(0))).toBeCloseTo(5, 4);
    expect(Math.min(...axis(2))).toBeCloseTo(-7.8, 4);
    expect(Math.max(...axis(2))).toBeCloseTo(7.8, 4);
  });

  it('outlines each rail and slot on the face when the joint is a dovetail', () => {
    const kit = previewKit(dovetailRequest);
    expect(kit.manifest).toEqual(summarizeKit(dovetailRequest));
    expect(kit.outlines.rails).toHaveLength(3);
    const [rail, slot] = [kit.outlines.rails![1]!, kit.outlines.slots![1]!];
    // The slot is wider than the rail by the clearance on each side.
    expect(slot.maxX - slot.minX).toBeGreaterThan(rail.maxX - rail.minX);
    expect((rail.minX + rail.maxX) / 2).toBeCloseTo(kit.manifest.parts[0]!.positions![1]![0], 6);
  });
});
