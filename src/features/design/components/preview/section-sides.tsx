import { BackSide, FrontSide, type BufferGeometry, type Plane } from 'three';

interface SectionSidesProps {
  geometry: BufferGeometry;
  /** Colour of the solid's outside (front faces). */
  outside: string;
  /** Colour seen through the cut, inside the solid (back faces): the cut fill, or the empty colour for a cutter. */
  inside: string;
  /** Draw the outside flat too: a pocket's wall seen from the half around it is cut material of that half. */
  flatOutside?: boolean;
  clip: Plane[];
  /**
   * Pull the fill towards the camera by this many steps where faces coincide at z = 0 (seen once the user turns the
   * view): 1 for the halves, so a ray crossing the cut face shows its own half; 2 for a rail, whose floor lies on
   * that face too. Never for a cutter: at grazing angles the offset grows with the slope and would draw the empty
   * colour over the key inside it.
   */
  offsetFill?: number;
}

/**
 * One closed solid of the "Cut through" view, drawn so the section reads as a drawing without stencils. Behind the
 * plane (everything in front is clipped) a ray meets first the surface of whatever its point on the plane lies in:
 * from inside a solid that is one of its back faces, unless a nested solid comes first, whose front face it then
 * meets. So back faces carry the cut fill: the halves' fill, the key's fill, and for pocket and slot cutters the empty
 * colour, which leaves the clearance between key and wall as a background-coloured gap. A pocket's front face is
 * only ever seen from inside its half, so it takes that half's fill.
 */
export function SectionSides({ geometry, outside, inside, flatOutside, clip, offsetFill }: SectionSidesProps) {
  return (
    <>
      <mesh geometry={geometry}>
        {flatOutside ? (
          <meshBasicMaterial color={outside} side={FrontSide} clippingPlanes={clip} toneMapped={false} />
        ) : (
          <meshStandardMaterial color={outside} side={FrontSide} clippingPlanes={clip} roughness={0.7} />
        )}
      </mesh>
      <mesh geometry={geometry}>
        <meshBasicMaterial
          color={inside}
          side={BackSide}
          clippingPlanes={clip}
          toneMapped={false}
          polygonOffset={Boolean(offsetFill)}
          polygonOffsetFactor={-(offsetFill ?? 0)}
          polygonOffsetUnits={-(offsetFill ?? 0)}
        />
      </mesh>
    </>
  );
}
