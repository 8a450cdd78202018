import { boxFaces, iso, poly } from './iso';

// Eight keys as Seamwright lays them out on an 80 × 60 face (rounded), sorted back to front for drawing.
const KEYS: Array<readonly [number, number]> = (
  [
    [-32, 22],
    [0, 22],
    [32, 22],
    [-16, 0],
    [16, 0],
    [-32, -22],
    [0, -22],
    [32, -22],
  ] as const
).toSorted((a, b) => a[0] - a[1] - (b[0] - b[1]));

const K = 5; // half a key's width
const P = 5.6; // half a pocket's width, drawn wider so the clearance reads

function Box({
  b,
  top,
  front,
  right,
  opacity = 1,
}: {
  b: ReturnType<typeof boxFaces>;
  top: string;
  front: string;
  right: string;
  opacity?: number;
}) {
  return (
    <g opacity={opacity} stroke="#1f2a30" strokeWidth="0.6" strokeLinejoin="round">
      <polygon points={b.front} fill={front} />
      <polygon points={b.right} fill={right} />
      <polygon points={b.top} fill={top} />
    </g>
  );
}

// Two keys hover above their empty pockets so the pockets show.
const HOVER = new Set(['0,-22', '32,-22']);

function Pocket({ x, y }: { x: number; y: number }) {
  const top = -2;
  const floor = -9;
  const opening = poly([x - P, y - P, top], [x + P, y - P, top], [x + P, y + P, top], [x - P, y + P, top]);
  const clip = `pocket-${x}-${y}`;
  return (
    <g stroke="#1f2a30" strokeWidth="0.4" strokeLinejoin="round">
      <clipPath id={clip}>
        <polygon points={opening} />
      </clipPath>
      <polygon points={opening} fill="#263a46" />
      <g clipPath={`url(#${clip})`}>
        {/* The two inner walls the viewer sees: the back wall and the left wall. */}
        <polygon
          points={poly([x - P, y + P, top], [x + P, y + P, top], [x + P, y + P, floor], [x - P, y + P, floor])}
          fill="#7f97a4"
        />
        <polygon
          points={poly([x - P, y - P, top], [x - P, y + P, top], [x - P, y + P, floor], [x - P, y - P, floor])}
          fill="#5d7886"
        />
      </g>
      <polygon points={opening} fill="none" />
    </g>
  );
}

/**
 * The home page's picture: a block split in two and pulled apart, keys standing in their pockets on the
 * lower half (two still above theirs), the upper half waiting above. Drawn by hand in SVG so the home page
 * stays light.
 */
export function JointIllustration() {
  const halfA = boxFaces(-40, 40, -30, 30, -24, -2);
  const halfB = boxFaces(-40, 40, -30, 30, 42, 60);
  const shadow = iso([0, 0, -26]).split(',').map(Number);
  return (
    <svg viewBox="-88 -100 176 168" className="h-auto w-full" role="img" aria-labelledby="joint-picture-title">
      <title id="joint-picture-title">
        A block cut in two and pulled apart: square keys stand in matching pockets on the lower half, two more wait
        above their empty pockets, and the upper half hangs above, ready to drop onto them.
      </title>
      <ellipse cx={shadow[0]} cy={(shadow[1] ?? 0) + 8} rx="72" ry="11" fill="#1f2a30" opacity="0.08" />
      <Box b={halfA} top="#c8d3d9" front="#3f5f72" right="#557587" />
      {KEYS.map(([x, y]) => (
        <Pocket key={`p${x},${y}`} x={x} y={y} />
      ))}
      {KEYS.map(([x, y]) => {
        const lift = HOVER.has(`${x},${y}`) ? 14 : 0;
        const k = boxFaces(x - K, x + K, y - K, y + K, -2 + lift, 13 + lift);
        return <Box key={`k${x},${y}`} b={k} top="#a7d1b1" front="#3d6a4c" right="#4f8361" />;
      })}
      <Box b={halfB} top="#f3dcc6" front="#b0764a" right="#c58d62" />
      <g fontSize="6" fill="#1f2a30" fontWeight="600">
        <text x="-86" y="40">
          half A
        </text>
        <text x="-86" y="-40">
          half B
        </text>
        <text x="66" y="-2">
          keys
        </text>
      </g>
    </svg>
  );
}
