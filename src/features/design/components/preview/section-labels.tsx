import type { RefObject } from 'react';
import type { KitManifest } from '../../../../../shared/kit/kit-manifest';
import type { SectionView } from '../../lib/section-view';
import { withUnit, type LengthUnit } from '../../lib/units';

/**
 * The section view's caption under the picture (kept off the picture, where it would hide the top of a rail): where
 * it cuts and the clearance per side.
 */
export function SectionCaption({
  manifest,
  section,
  unit,
}: {
  manifest: KitManifest;
  section: SectionView;
  unit: LengthUnit;
}) {
  const keys = manifest.request.joint === 'key';
  return (
    <p className="text-sm text-ink" data-testid="section-label">
      Cut at y = {withUnit(section.y, unit)} through the {keys ? 'keys' : 'rails'}:{' '}
      <strong>clearance {withUnit(manifest.clearancePerSide, unit)} per side</strong> between{' '}
      {keys ? 'each key and its pocket wall' : 'each rail and its slot'}, the light gap beside the{' '}
      {keys ? 'key' : 'rail'}. Cut faces are drawn flat in the colours below.
    </p>
  );
}

/**
 * The clearance on a pin pointing at the gap between key and pocket wall (rail and slot flank); {@link GapPin} moves
 * it with the camera. It repeats the caption, so screen readers skip it.
 */
export function GapLabel({
  clearance,
  unit,
  pin,
}: {
  clearance: number;
  unit: LengthUnit;
  pin: RefObject<HTMLDivElement | null>;
}) {
  return (
    // Starts hidden; GapPin shows it once the gap's place on screen is known.
    <div
      ref={pin}
      className="pointer-events-none invisible absolute top-0 left-0"
      aria-hidden="true"
      data-testid="section-gap-label"
    >
      <div className="absolute top-0 left-1 flex -translate-y-1/2 items-center">
        <span className="block h-0.5 w-7 bg-ink" />
        <span className="rounded-md bg-paper/95 px-2 py-0.5 text-sm font-semibold whitespace-nowrap text-ink shadow">
          {withUnit(clearance, unit)} gap
        </span>
      </div>
    </div>
  );
}
