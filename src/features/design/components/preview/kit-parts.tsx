import { useLayoutEffect, useRef, type ReactNode } from 'react';
import { BackSide, DoubleSide, FrontSide, Matrix4, type BufferGeometry, type InstancedMesh, type Plane } from 'three';
import type { PreviewKit } from '../../lib/preview-kit';
import { useBufferGeometry } from './use-buffer-geometry';
import { PREVIEW_COLORS, SECTION_COLORS } from './preview-colors';
import { SectionSides } from './section-sides';

/** Clipping planes: `all` for the halves, `parts` for keys and rails, `A` and `B` trim a cutter to its own half. */
export interface PartClips {
  all: Plane[];
  parts: Plane[];
  A: Plane[];
  B: Plane[];
}

/**
 * How one solid is drawn: see-through (cutters), solid (rails); in the section view a rail is `cut` (shaded outside,
 * key fill inside) and a cutter is the empty space it leaves in its half.
 */
type Look = { kind: 'see' | 'solid' | 'cut'; color: string } | { kind: 'cutter'; half: 'A' | 'B' };

function Solid({ mesh, look, clip }: { mesh: PreviewKit['meshes'][number] | undefined; look: Look; clip: Plane[] }) {
  const geometry = useBufferGeometry(mesh);
  if (!geometry) return null;
  if (look.kind === 'cutter')
    return (
      <SectionSides
        geometry={geometry}
        outside={SECTION_COLORS[look.half === 'A' ? 'halfA' : 'halfB']}
        flatOutside
        inside={SECTION_COLORS.empty}
        clip={clip}
      />
    );
  if (look.kind === 'cut')
    return (
      <SectionSides geometry={geometry} outside={look.color} inside={SECTION_COLORS.key} clip={clip} offsetFill={2} />
    );
  const see = look.kind === 'see';
  return (
    <mesh geometry={geometry} renderOrder={see ? 1 : 0}>
      <meshStandardMaterial
        color={look.color}
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

/** One key geometry drawn at every pocket centre, with the given material. */
function KeyInstances({
  geometry,
  positions,
  children,
}: {
  geometry: BufferGeometry;
  positions: ReadonlyArray<readonly [number, number]>;
  children: ReactNode;
}) {
  const ref = useRef<InstancedMesh>(null);
  useLayoutEffect(() => {
    const m = new Matrix4();
    positions.forEach(([x, y], i) => ref.current?.setMatrixAt(i, m.makeTranslation(x, y, 0)));
    if (!ref.current) return;
    ref.current.instanceMatrix.needsUpdate = true;
    // The mesh outlives a build: its culling sphere must follow the new keys.
    ref.current.computeBoundingSphere();
  }, [positions, geometry]);
  // Remade only when the key count changes; a new key shape just swaps the geometry (and the mesh keeps its material).
  return (
    <instancedMesh ref={ref} args={[undefined, undefined, positions.length]} geometry={geometry} key={positions.length}>
      {children}
    </instancedMesh>
  );
}

function Keys({ kit, clip, section }: { kit: PreviewKit; clip: Plane[]; section: boolean }) {
  const geometry = useBufferGeometry(kit.keyInPlace);
  const positions = kit.manifest.parts[1]?.positions ?? [];
  if (!geometry) return null;
  if (!section)
    return (
      <KeyInstances geometry={geometry} positions={positions}>
        <meshStandardMaterial color={PREVIEW_COLORS.key} side={DoubleSide} clippingPlanes={clip} roughness={0.6} />
      </KeyInstances>
    );
  // The section's two sides (see SectionSides): shaded outside, flat fill where the plane cuts a key.
  return (
    <>
      <KeyInstances geometry={geometry} positions={positions}>
        <meshStandardMaterial color={PREVIEW_COLORS.key} side={FrontSide} clippingPlanes={clip} roughness={0.6} />
      </KeyInstances>
      <KeyInstances geometry={geometry} positions={positions}>
        <meshBasicMaterial color={SECTION_COLORS.key} side={BackSide} clippingPlanes={clip} toneMapped={false} />
      </KeyInstances>
    </>
  );
}

/**
 * The kit's solids in place: keys in their pockets, or rails on half A in the slots of half B. With `section`, the
 * cutters become the empty space they leave and the cut shows as flat fills (see {@link SectionSides}).
 */
export function KitParts({
  kit,
  lift,
  clips,
  section,
}: {
  kit: PreviewKit;
  lift: number;
  clips: PartClips;
  section: boolean;
}) {
  const cutter = (half: 'A' | 'B'): Look =>
    section ? { kind: 'cutter', half } : { kind: 'see', color: PREVIEW_COLORS.pocket };
  if (kit.manifest.request.joint === 'key') {
    return (
      <>
        <group position={[0, 0, -lift]}>
          <Solid mesh={kit.meshes[1]} look={cutter('A')} clip={clips.A} />
        </group>
        <group position={[0, 0, lift]}>
          <Solid mesh={kit.meshes[2]} look={cutter('B')} clip={clips.B} />
        </group>
        <Keys kit={kit} clip={clips.parts} section={section} />
      </>
    );
  }
  return (
    <>
      <group position={[0, 0, -lift]}>
        <Solid
          mesh={kit.meshes[0]}
          look={{ kind: section ? 'cut' : 'solid', color: PREVIEW_COLORS.key }}
          clip={clips.parts}
        />
      </group>
      <group position={[0, 0, lift]}>
        <Solid mesh={kit.meshes[1]} look={cutter('B')} clip={clips.B} />
      </group>
    </>
  );
}
