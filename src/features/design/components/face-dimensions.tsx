import type { Face } from '../../../../shared/schemas/face';
import { withUnit, type LengthUnit } from '../lib/units';

interface Extent {
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
}

/** Dimension lines under and beside the face outline: overall width and height (or the diameter). */
export function FaceDimensions({
  extent: e,
  face,
  pad,
  text,
  unit,
}: {
  extent: Extent;
  face: Face;
  pad: number;
  text: number;
  unit: LengthUnit;
}) {
  const below = -e.minY + pad * 0.45;
  const left = e.minX - pad * 0.45;
  const tick = pad * 0.12;
  const width = e.maxX - e.minX;
  const height = e.maxY - e.minY;
  const widthLabel = face.shape === 'circle' ? `⌀ ${withUnit(width, unit)}` : withUnit(width, unit);
  return (
    <g>
      <line x1={e.minX} y1={below} x2={e.maxX} y2={below} className="dim" />
      <line x1={e.minX} y1={below - tick} x2={e.minX} y2={below + tick} className="dim" />
      <line x1={e.maxX} y1={below - tick} x2={e.maxX} y2={below + tick} className="dim" />
      <text x={(e.minX + e.maxX) / 2} y={below + text * 1.2} textAnchor="middle" fontSize={text} className="dimtext">
        {widthLabel}
      </text>
      {face.shape !== 'circle' && (
        <g>
          <line x1={left} y1={-e.maxY} x2={left} y2={-e.minY} className="dim" />
          <line x1={left - tick} y1={-e.maxY} x2={left + tick} y2={-e.maxY} className="dim" />
          <line x1={left - tick} y1={-e.minY} x2={left + tick} y2={-e.minY} className="dim" />
          <text
            x={left - text * 0.5}
            y={-(e.minY + e.maxY) / 2}
            textAnchor="middle"
            fontSize={text}
            className="dimtext"
            transform={`rotate(-90 ${left - text * 0.5} ${-(e.minY + e.maxY) / 2})`}
          >
            {withUnit(height, unit)}
          </text>
        </g>
      )}
    </g>
  );
}
