import { memo } from 'react';
import type { Face } from '../../../../shared/schemas/face';
import type { PreviewKit } from '../lib/preview-kit';
import { withUnit, type LengthUnit } from '../lib/units';
import { FaceDimensions } from './face-dimensions';
import { PositionsTable } from './positions-table';

interface FaceDrawingProps {
  /** The face the form asks for now (null while the form has errors). */
  face: Face | null;
  /** The newest build, unless it failed. */
  kit: PreviewKit | null;
  failure: string | null;
  unit: LengthUnit;
}

export function faceExtent(face: Face) {
  if (face.shape === 'rect')
    return { minX: -face.width / 2, maxX: face.width / 2, minY: -face.height / 2, maxY: face.height / 2 };
  if (face.shape === 'circle')
    return { minX: -face.diameter / 2, maxX: face.diameter / 2, minY: -face.diameter / 2, maxY: face.diameter / 2 };
  const xs = face.points.map((p) => p[0]);
  const ys = face.points.map((p) => p[1]);
  return { minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) };
}

const ring = (points: ReadonlyArray<readonly [number, number]>, dx = 0, dy = 0) =>
  points.map(([x, y], i) => `${i === 0 ? 'M' : 'L'}${x + dx} ${-(y + dy)}`).join(' ') + ' Z';

function FaceOutline({ face }: { face: Face }) {
  const style = { fill: '#ece8df', stroke: '#1f2a30', strokeWidth: 'var(--line)' };
  if (face.shape === 'rect')
    return <rect x={-face.width / 2} y={-face.height / 2} width={face.width} height={face.height} style={style} />;
  if (face.shape === 'circle') return <circle r={face.diameter / 2} style={style} />;
  return <path d={ring(face.points)} style={style} />;
}

function KeyPockets({ kit, text }: { kit: PreviewKit; text: number }) {
  const r = kit.manifest.request;
  if (r.joint !== 'key') return null;
  const pocket = kit.outlines.pocket ?? [];
  const positions = kit.manifest.parts[1]?.positions ?? [];
  const xs = pocket.map((p) => p[0]);
  const ys = pocket.map((p) => p[1]);
  const m = r.key.margin;
  const halfW = Math.max(...xs) + m;
  const halfH = Math.max(...ys) + m;
  return (
    <g>
      {positions.map(([x, y], i) => (
        <g key={i}>
          {r.key.shape === 'round' ? (
            <circle cx={x} cy={-y} r={halfW} className="wall" />
          ) : (
            <rect x={x - halfW} y={-y - halfH} width={2 * halfW} height={2 * halfH} className="wall" />
          )}
          <path d={ring(pocket, x, y)} className="pocket" />
          <text x={x} y={-y + text * 0.35} textAnchor="middle" fontSize={text} className="label">
            {i + 1}
          </text>
        </g>
      ))}
    </g>
  );
}

function Rails({ kit, text }: { kit: PreviewKit; text: number }) {
  const slots = kit.outlines.slots ?? [];
  const rails = kit.outlines.rails ?? [];
  return (
    <g>
      {slots.map((b, i) => (
        <rect
          key={`s${i}`}
          x={b.minX}
          y={-b.maxY}
          width={b.maxX - b.minX}
          height={b.maxY - b.minY}
          className="pocket"
        />
      ))}
      {rails.map((b, i) => (
        <g key={`r${i}`}>
          <rect x={b.minX} y={-b.maxY} width={b.maxX - b.minX} height={b.maxY - b.minY} className="rail" />
          <text
            x={(b.minX + b.maxX) / 2}
            y={-b.maxY - text * 0.4}
            textAnchor="middle"
            fontSize={text}
            className="label"
          >
            {i + 1}
          </text>
        </g>
      ))}
    </g>
  );
}

/**
 * The cut face to scale, seen from above half A: its outline and sizes, every pocket (numbered, with the
 * wall the layout keeps around it) or every rail and slot, and what did not fit, with the reason.
 */
export const FaceDrawing = memo(function FaceDrawing({ face, kit, failure, unit }: FaceDrawingProps) {
  if (!face) return null;
  const e = faceExtent(face);
  const size = Math.max(e.maxX - e.minX, e.maxY - e.minY);
  const pad = size * 0.16 + 4;
  const text = size * 0.04 + 1;
  const viewBox = `${e.minX - pad} ${-e.maxY - pad} ${e.maxX - e.minX + 2 * pad} ${e.maxY - e.minY + 2 * pad}`;
  const showKit = kit && !failure;
  return (
    <section aria-labelledby="drawing-title" className="space-y-3">
      <h2 id="drawing-title" className="text-lead font-bold">
        Face drawing
      </h2>
      {failure && (
        <div
          role="alert"
          className="rounded-md border-l-4 border-kiln bg-kiln-pale px-4 py-3 text-ink"
          data-testid="fit-failure"
        >
          <p className="font-bold">This does not fit yet</p>
          <p>{failure}</p>
        </div>
      )}
      <figure className="rounded-card border border-ink-faint bg-white p-2">
        <svg
          viewBox={viewBox}
          className="face-drawing h-auto w-full"
          role="img"
          aria-labelledby="drawing-caption"
          style={{ ['--line' as string]: `${size * 0.004 + 0.15}px` }}
        >
          <style>{`.face-drawing .wall{fill:none;stroke:#3d6a4c;stroke-dasharray:${size * 0.012} ${size * 0.008};stroke-width:var(--line)}
.face-drawing .pocket{fill:#fbe9df;stroke:#a8471f;stroke-width:var(--line)}
.face-drawing .rail{fill:#3d6a4c;fill-opacity:.35;stroke:#3d6a4c;stroke-width:var(--line)}
.face-drawing .label{fill:#1f2a30;font-weight:600}
.face-drawing .dim{stroke:#44535c;stroke-width:var(--line)}
.face-drawing .dimtext{fill:#1f2a30}`}</style>
          <FaceOutline face={face} />
          {showKit && <KeyPockets kit={kit} text={text} />}
          {showKit && <Rails kit={kit} text={text} />}
          <FaceDimensions extent={e} face={face} pad={pad} text={text} unit={unit} />
        </svg>
        <figcaption id="drawing-caption" className="px-2 pt-2 text-sm text-ink-soft">
          {showKit && kit.manifest.request.joint === 'key'
            ? `Seen from above half A. Orange: pocket mouths; green dashes: the ${withUnit(kit.manifest.request.key.margin, unit)} wall the layout keeps around each pocket.`
            : showKit
              ? 'Seen from above half A. Green: rails on half A; orange: the slots in half B (their widest outline).'
              : 'Seen from above half A.'}
        </figcaption>
      </figure>
      {showKit && <PositionsTable kit={kit} unit={unit} />}
    </section>
  );
});
