import { Canvas } from '@react-three/fiber';
import { useMemo, type Ref, type RefObject } from 'react';
import { Plane, Vector3 } from 'three';
import type { PreviewKit } from '../../lib/preview-kit';
import type { SectionView } from '../../lib/section-view';
import { CameraRig, type CameraCommands } from './camera-rig';
import { FaceSlab } from './face-slab';
import { GapPin } from './gap-pin';
import { KitParts, type PartClips } from './kit-parts';
import { PREVIEW_COLORS } from './preview-colors';
import { ShownMark } from './shown-mark';

/** How the kit is shown: assembled, pulled apart along z, or cut through the keys. */
export type ViewMode = 'assembled' | 'exploded' | 'section';

interface KitCanvasProps {
  kit: PreviewKit;
  buildId: number;
  mode: ViewMode;
  /** Where the "Cut through" view cuts and what it frames; null when the kit has nothing to cut. */
  section: SectionView | null;
  cameraRef: Ref<CameraCommands>;
  keyTarget: HTMLElement | null;
  /** The clearance label, moved onto the gap while the section is shown. */
  gapLabel: RefObject<HTMLElement | null>;
}

function faceSize(kit: PreviewKit): number {
  const f = kit.manifest.request.face;
  if (f.shape === 'rect') return Math.max(f.width, f.height);
  if (f.shape === 'circle') return f.diameter;
  const xs = f.points.map((p) => p[0]);
  const ys = f.points.map((p) => p[1]);
  return Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys));
}

const NO_CLIPS: PartClips = { all: [], parts: [], A: [], B: [] };

/**
 * The section plane y = `y`, keeping y ≥ `y` (the camera looks at the cut from the −y side), for everything. Keys,
 * rails and cutters also end `reach` mm behind it, and each cutter is trimmed to its own half: a pocket cutter pokes
 * 1 mm past the face so the subtraction leaves no skin, which would otherwise show as the other half's fill.
 */
function sectionClips(y: number, reach: number): PartClips {
  const cut = new Plane(new Vector3(0, 1, 0), -y);
  const far = new Plane(new Vector3(0, -1, 0), y + reach);
  return {
    all: [cut],
    parts: [cut, far],
    A: [cut, far, new Plane(new Vector3(0, 0, -1), 0)],
    B: [cut, far, new Plane(new Vector3(0, 0, 1), 0)],
  };
}

/** The 3D view of a built kit. Draws only; every solid arrives ready-made from the preview worker. */
export function KitCanvas({ kit, buildId, mode, section, cameraRef, keyTarget, gapLabel }: KitCanvasProps) {
  const size = faceSize(kit);
  const r = kit.manifest.request;
  const depth = r.joint === 'key' ? (kit.manifest.derived.pocketDepth ?? r.key.depth) : r.dovetail.height;
  const thickness = Math.max(10, depth * 1.8);
  const lift = mode === 'exploded' ? thickness * 0.9 : 0;
  const cut = mode === 'section' && section ? section : null;
  const cutY = cut?.y;
  const reach = cut?.reach ?? 0;
  const clips = useMemo(() => (cutY === undefined ? NO_CLIPS : sectionClips(cutY, reach)), [cutY, reach]);
  return (
    <Canvas
      frameloop="demand"
      dpr={[1, 2]}
      camera={{ fov: 35, near: 0.5, far: 20000, up: [0, 0, 1], position: [size, -size * 1.4, size] }}
      onCreated={({ gl }) => {
        gl.localClippingEnabled = true;
      }}
      aria-hidden="true"
    >
      <color attach="background" args={[PREVIEW_COLORS.background]} />
      <hemisphereLight args={['#ffffff', '#8a8070', 1.6]} />
      <directionalLight position={[size, -size * 2, size * 3]} intensity={1.6} />
      <directionalLight position={[-size, size, -size]} intensity={0.4} />
      <group position={[0, 0, -lift]}>
        <FaceSlab
          face={r.face}
          half="A"
          thickness={thickness}
          color={PREVIEW_COLORS.halfA}
          clip={clips.all}
          section={Boolean(cut)}
        />
      </group>
      <group position={[0, 0, lift]}>
        <FaceSlab
          face={r.face}
          half="B"
          thickness={thickness}
          color={PREVIEW_COLORS.halfB}
          clip={clips.all}
          section={Boolean(cut)}
        />
      </group>
      <KitParts kit={kit} lift={lift} clips={clips} section={Boolean(cut)} />
      <CameraRig size={size} ref={cameraRef} keyTarget={keyTarget} section={cut} />
      {cut && <GapPin x={cut.gapX} y={cut.y} z={cut.gapZ} label={gapLabel} />}
      <ShownMark buildId={buildId} />
    </Canvas>
  );
}
