import { useLayoutEffect, useRef } from 'react';
import { DoubleSide, Matrix4, type InstancedMesh, type Plane } from 'three';
import type { PreviewKit } from '../../lib/preview-kit';
import { useBufferGeometry } from './use-buffer-geometry';
import { PREVIEW_COLORS } from './preview-colors';

function Solid({
  mesh,
  color,
  clip,
  see,
}: {
  mesh: PreviewKit['meshes'][number] | undefined;
  color: string;
  clip: Plane[];
  see?: boolean;
}) {
  const geometry = useBufferGeometry(mesh);
  if (!geometry) return null;
  return (
    <mesh geometry={geometry} renderOrder={see ? 1 : 0}>
      <meshStandardMaterial
        color={color}
        transparent={see}
        opacity={see ? 0.24 : 1}
        depthWrite={!see}
        side={DoubleSide}
        clippingPlanes={clip}
        roughness={0.7}
      />
    </mesh>
  );
}

function Keys({ kit, clip }: { kit: PreviewKit; clip: Plane[] }) {
  const geometry = useBufferGeometry(kit.keyInPlace);
  const ref = useRef<InstancedMesh>(null);
  const positions = kit.manifest.parts[1]?.positions ?? [];
  useLayoutEffect(() => {
    const m = new Matrix4();
    positions.forEach(([x, y], i) => ref.current?.setMatrixAt(i, m.makeTranslation(x, y, 0)));
    if (ref.current) ref.current.instanceMatrix.needsUpdate = true;
  }, [positions, geometry]);
  if (!geometry) return null;
  return (
    <instancedMesh
      ref={ref}
      args={[geometry, undefined, positions.length]}
      key={`${positions.length}-${geometry.uuid}`}
    >
      <meshStandardMaterial color={PREVIEW_COLORS.key} side={DoubleSide} clippingPlanes={clip} roughness={0.6} />
    </instancedMesh>
  );
}

/** The kit's solids in place: keys in their pockets, or rails on half A in the slots of half B. */
export function KitParts({ kit, lift, clip }: { kit: PreviewKit; lift: number; clip: Plane[] }) {
  if (kit.manifest.request.joint === 'key') {
    return (
      <>
        <group position={[0, 0, -lift]}>
          <Solid mesh={kit.meshes[1]} color={PREVIEW_COLORS.pocket} clip={clip} see />
        </group>
        <group position={[0, 0, lift]}>
          <Solid mesh={kit.meshes[2]} color={PREVIEW_COLORS.pocket} clip={clip} see />
        </group>
        <Keys kit={kit} clip={clip} />
      </>
    );
  }
  return (
    <>
      <group position={[0, 0, -lift]}>
        <Solid mesh={kit.meshes[0]} color={PREVIEW_COLORS.key} clip={clip} />
      </group>
      <group position={[0, 0, lift]}>
        <Solid mesh={kit.meshes[1]} color={PREVIEW_COLORS.pocket} clip={clip} see />
      </group>
    </>
  );
}
