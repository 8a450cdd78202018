import { Canvas } from '@react-three/fiber';
import { useMemo, type Ref } from 'react';
import { Plane, Vector3 } from 'three';
import type { PreviewKit } from '../../lib/preview-kit';
import { CameraRig, type CameraCommands } from './camera-rig';
import { FaceSlab } from './face-slab';
import { KitParts } from './kit-parts';
import { PREVIEW_COLORS } from './preview-colors';
import { ShownMark } from './shown-mark';

/** How the kit is shown: assembled, pulled apart along z, or cut through the keys. */
export type ViewMode = 'assembled' | 'exploded' | 'section';

interface KitCanvasProps {
  kit: PreviewKit;
  buildId: number;
  mode: ViewMode;
  /** y of the section plane, mm. */
  sectionY: number;
  cameraRef: Ref<CameraCommands>;
  keyTarget: HTMLElement | null;
}

function faceSize(kit: PreviewKit): number {
  const f = kit.manifest.request.face;
  if (f.shape === 'rect') return Math.max(f.width, f.height);
  if (f.shape === 'circle') return f.diameter;
  const xs = f.points.map((p) => p[0]);
  const ys = f.points.map((p) => p[1]);
  return Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys));
}

/** The 3D view of a built kit. Draws only; every solid arrives ready-made from the preview worker. */
export function KitCanvas({ kit, buildId, mode, sectionY, cameraRef, keyTarget }: KitCanvasProps) {
  const size = faceSize(kit);
  const r = kit.manifest.request;
  const depth = r.joint === 'key' ? (kit.manifest.derived.pocketDepth ?? r.key.depth) : r.dovetail.height;
  const thickness = Math.max(10, depth * 1.8);
  const lift = mode === 'exploded' ? thickness * 0.9 : 0;
  // Keep the half with y greater than the plane: the camera looks at the cut from the −y side.
  const clip = useMemo(
    () => (mode === 'section' ? [new Plane(new Vector3(0, 1, 0), -sectionY)] : []),
    [mode, sectionY],
  );
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
          face={kit.manifest.request.face}
          half="A"
          thickness={thickness}
          color={PREVIEW_COLORS.halfA}
          clip={clip}
        />
      </group>
      <group position={[0, 0, lift]}>
        <FaceSlab
          face={kit.manifest.request.face}
          half="B"
          thickness={thickness}
          color={PREVIEW_COLORS.halfB}
          clip={clip}
        />
      </group>
      <KitParts kit={kit} lift={lift} clip={clip} />
      <CameraRig size={size} ref={cameraRef} keyTarget={keyTarget} />
      <ShownMark buildId={buildId} />
    </Canvas>
  );
}
