import type { PreviewKit } from '../lib/preview-kit';
import { withUnit, type LengthUnit } from '../lib/units';

/** Where each pocket or rail sits on the face, numbered as in the drawing. */
export function PositionsTable({ kit, unit }: { kit: PreviewKit; unit: LengthUnit }) {
  const isKey = kit.manifest.request.joint === 'key';
  const positions = kit.manifest.parts.find((p) => p.positions)?.positions ?? [];
  const rails = kit.outlines.rails ?? [];
  return (
    <details className="rounded-md border border-paper-deep bg-white px-3 py-2">
      <summary className="cursor-pointer font-medium">
        {isKey ? `Pocket centres (${positions.length})` : `Rail positions (${positions.length})`}
      </summary>
      <table className="mt-2 w-full text-left tabular-nums">
        <caption className="sr-only">
          {isKey ? 'Pocket centres on the cut face' : 'Rail centre lines on the cut face'}
        </caption>
        <thead>
          <tr className="border-b border-paper-deep">
            <th scope="col" className="py-1 pr-4">
              #
            </th>
            <th scope="col" className="py-1 pr-4">
              x
            </th>
            <th scope="col" className="py-1 pr-4">
              {isKey ? 'y' : 'length'}
            </th>
          </tr>
        </thead>
        <tbody>
          {positions.map(([x, y], i) => (
            <tr key={i} className="border-b border-paper-deep last:border-0">
              <td className="py-1 pr-4">{i + 1}</td>
              <td className="py-1 pr-4">{withUnit(x, unit)}</td>
              <td className="py-1 pr-4">
                {isKey ? withUnit(y, unit) : withUnit((rails[i]?.maxY ?? 0) - (rails[i]?.minY ?? 0), unit)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </details>
  );
}
