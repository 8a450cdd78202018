import { placeKeys } from '../../shared/geometry/layout';
import { placeRails } from '../../shared/geometry/place-rails';
import { pocketSection } from '../../shared/geometry/section/pocket-section';
import { dovetailSection } from '../../shared/geometry/section/dovetail-section';
import { degreesToRadians } from '../../shared/geometry/units';
import { keyFootprint, keyLabel } from '../../shared/kit/key-footprint';
import { keyKitFit } from '../../shared/kit/key-kit-fit';
import { resolveClearance } from '../../shared/fit';
import type { ResolvedKitRequest } from '../../shared/schemas/kit-request';

/**
 * Everything a kit needs before any solid is built: the fit and where the keys or rails go. Both engines in
 * the benchmark need these same positions to build "the same solids", so both pipelines run this code.
 */
export function layoutOnly(request: ResolvedKitRequest): unknown {
  if (request.joint === 'key') {
    const k = request.key;
    const fit = keyKitFit(request);
    const section = pocketSection({ ...k, chordTolerance: request.chordTolerance });
    const footprint = keyFootprint(section, fit.pocketGrowth + k.entryChamfer, k.shape === 'round');
    return placeKeys({ face: request.face, footprint, margin: k.margin, count: k.count, keyLabel: keyLabel(k) });
  }
  const d = request.dovetail;
  const { clearancePerSide } = resolveClearance(request);
  const section = { rootWidth: d.rootWidth, height: d.height, flankAngle: degreesToRadians(d.angleDeg) };
  dovetailSection(section);
  return placeRails({ ...d, ...section, face: request.face, clearance: clearancePerSide });
}
