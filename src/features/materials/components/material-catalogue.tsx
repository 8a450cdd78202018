import { Notice } from '../../../components/ui/notice';
import { ScrollX } from '../../../components/ui/scroll-x';
import { useCatalogue } from '../api/materials';

/** The built-in materials, read-only: shrinkage and clearance adjustment, each with where it comes from. */
export function MaterialCatalogue({ teamId }: { teamId: string }) {
  const { data, isPending, error } = useCatalogue(teamId);
  if (isPending) return <Notice>Loading the catalogue…</Notice>;
  if (error) return <Notice tone="error">{error.message}</Notice>;
  return (
    <ScrollX label="Built-in materials">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Built-in materials</caption>
        <thead className="border-b border-ink-faint text-ink-soft">
          <tr>
            <th scope="col" className="py-2">
              Material
            </th>
            <th scope="col">Process</th>
            <th scope="col">Shrinkage</th>
            <th scope="col">Clearance adjustment</th>
          </tr>
        </thead>
        <tbody>
          {data.items.map((m) => (
            <tr key={m.id} className="border-b border-paper-deep align-top">
              <td className="py-2 pr-3 font-medium">{m.id}</td>
              <td className="pr-3">{m.process === 'fdm' ? 'FDM' : 'Resin'}</td>
              <td className="pr-3">
                {m.shrinkagePercent} % <span className="block text-ink-soft">{m.shrinkageSource}</span>
              </td>
              <td className="pr-3">
                {m.clearanceAdjustmentMm > 0 ? '+' : ''}
                {m.clearanceAdjustmentMm} mm per side{' '}
                <span className="block text-ink-soft">{m.clearanceAdjustmentSource}</span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollX>
  );
}
