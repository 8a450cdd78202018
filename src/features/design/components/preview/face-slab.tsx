import { useEffect, useMemo } from 'react';
import { ExtrudeGeometry, Shape, Vector2, type Plane } from 'three';
import type { Face } from '../../../../../shared/schemas/face';
import { SectionSides } from './section-sides';

/** The face's outline as a flat three.js shape in the cut plane, mm. */
function faceShape(face: Face): Shape {
  if (face.shape === 'rect') {
    const s = new Shape();
    s.moveTo(-face.width / 2, -face.height / 2);
    s.lineTo(face.width / 2, -face.height / 2);
    s.lineTo(face.width / 2, face.height / 2);
    s.lineTo(-face.width / 2, face.height / 2);
    s.closePath();
    return s;
  }
  if (face.shape === 'circle') {
    const s = new Shape();
    s.absarc(0, 0, face.diameter / 2, 0, Math.PI * 2, false);
    return s;
  }
  return new Shape(face.points.map(([x, y]) => new Vector2(x, y)));
}

interface FaceSlabProps {
  face: Face;
  /** Half A reaches down from the cut face, half B up from it. */
  half: 'A' | 'B';
  thickness: number;
  color: string;
  clip: Plane[];
  /** The "Cut through" view: solid, with the cut filled in `color` (see {@link SectionSides}). */
  section?: boolean;
}

/**
 * A stand-in for one half of the maker's model: the cut face pushed out `thickness` mm, drawn see-through
 * so the pockets, keys and rails inside show. It is only a picture; the kit never contains it.
 */
export function FaceSlab({ face, half, thickness, color, clip, section }: FaceSlabProps) {
  // Every build brings a new face object from the worker: key the slab on the face's values, so a change of any
  // other setting reuses the slab instead of re-triangulating and re-uploading it.
  const faceKey = JSON.stringify(face);
  const geometry = useMemo(() => {
    const g = new ExtrudeGeometry(faceShape(JSON.parse(faceKey) as Face), {
      depth: thickness,
      bevelEnabled: false,
      curveSegments: 48,
    });
    if (half === 'A') g.translate(0, 0, -thickness);
    return g;
  }, [faceKey, half, thickness]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  if (section) return <SectionSides geometry={geometry} outside={color} inside={color} clip={clip} offsetFill={1} />;
  return (
    <mesh geometry={geometry} renderOrder={2}>
      <meshStandardMaterial
        color={color}
        transparent
        opacity={0.16}
        depthWrite={false}
        clippingPlanes={clip}
        roughness={0.9}
      />
    </mesh>
  );
}
