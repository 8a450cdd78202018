import { describe, expect, it } from 'vitest';
import { kitRequestSchema } from '../../../../../shared/schemas/kit-request';
import { previewKit } from '../../../../../src/features/design/lib/preview-kit';
import { sectionView } from '../../../../../src/features/design/lib/section-view';

// The reference kits of the speed targets (tests/bench/reference-kits.ts).
const squareKeys = previewKit(
  kitRequestSchema.parse({
    joint: 'key',
    material: 'PLA',
    fit: 'snug',
    face: { shape: 'rect', width: 80, height: 60 },
    key: { shape: 'square', width: 10, depth: 8, count: 8 },
  }),
);
const rails = previewKit(
  kitRequestSchema.parse({
    joint: 'dovetail',
    material: 'PLA',
    fit: 'snug',
    face: { shape: 'rect', width: 90, height: 90 },
    dovetail: { rootWidth: 12, height: 6, count: 3 },
  }),
);

describe('sectionView', () => {
  it('cuts through the centre of the key nearest the middle of the layout when the joint is keys', () => {
    const s = sectionView(squareKeys)!;
    const centres = squareKeys.manifest.parts[1]!.positions!;
    const nearest = Math.min(...centres.map(([x, y]) => Math.hypot(x, y)));
    expect(centres).toContainEqual([s.x, s.y]);
    expect(Math.hypot(s.x, s.y)).toBeCloseTo(nearest, 9);
  });

  it('puts the gap point between the key side and the pocket wall when the joint is keys', () => {
    const s = sectionView(squareKeys)!;
    const c = squareKeys.manifest.clearancePerSide;
    // A 10 mm square key: its side at x + 5, the pocket wall one clearance further out.
    expect(s.gapX - s.x).toBeCloseTo(5 + c / 2, 6);
    expect(s.gapZ).toBeLessThan(0);
    expect(s.gapZ).toBeGreaterThan(-squareKeys.manifest.derived.pocketDepth!);
  });

  it('frames the whole pocket pair with wall to spare when the joint is keys', () => {
    const s = sectionView(squareKeys)!;
    const depth = squareKeys.manifest.derived.pocketDepth!;
    expect(s.z).toBe(0);
    expect(s.width).toBeGreaterThan(2 * (5 + squareKeys.manifest.clearancePerSide));
    expect(s.height).toBeGreaterThan(2 * depth);
    // Close enough that 0.1 mm is still a visible fraction of the view: at most 40 mm across.
    expect(Math.max(s.width, s.height)).toBeLessThan(40);
  });

  it('draws the parts past the cut pocket but short of the next row when the joint is keys', () => {
    const s = sectionView(squareKeys)!;
    const half = 5 + squareKeys.manifest.clearancePerSide;
    const rows = [...new Set(squareKeys.manifest.parts[1]!.positions!.map(([, y]) => y))].filter((y) => y > s.y);
    expect(s.reach).toBeGreaterThan(half);
    expect(s.y + s.reach).toBeLessThan(Math.min(...rows) - half);
  });

  it('cuts across the middle rail, halfway along it, when the joint is a dovetail', () => {
    const s = sectionView(rails)!;
    expect(s.x).toBe(0);
    expect(s.y).toBeCloseTo(0, 3);
    const rail = rails.outlines.rails![1]!;
    const slot = rails.outlines.slots![1]!;
    expect(s.gapX).toBeGreaterThan(6);
    expect(s.gapX).toBeLessThan(slot.maxX);
    expect(s.gapZ).toBe(3);
    expect(s.width).toBeGreaterThan(slot.maxX - slot.minX);
    // A rail clipped short would be drawn open: the whole slot lies within reach.
    expect(s.y + s.reach).toBeGreaterThan(slot.maxY);
    expect(rail.maxX - rail.minX).toBeCloseTo(14, 3);
  });

  it('gives null when a key kit has no pocket centres', () => {
    const empty = { ...squareKeys, manifest: { ...squareKeys.manifest, parts: [] } };
    expect(sectionView(empty)).toBeNull();
  });
});
