import { memo } from 'react';
import type { ResolvedKitRequest } from '../../../../shared/schemas/kit-request';
import { cautionsFor } from '../lib/cautions';

/** The fit engine's warnings for these settings, then the safety cautions that apply to this kit. */
export const WarningsAndCautions = memo(function WarningsAndCautions({
  warnings,
  request,
}: {
  warnings: string[];
  request: ResolvedKitRequest;
}) {
  return (
    <section aria-labelledby="cautions-title" className="space-y-3">
      <h2 id="cautions-title" className="text-lead font-bold">
        Check before you print
      </h2>
      {warnings.length > 0 && (
        <ul className="space-y-2" data-testid="warnings">
          {warnings.map((w) => (
            <li key={w} className="rounded-md border-l-4 border-caution bg-caution-pale px-4 py-2">
              {w}
            </li>
          ))}
        </ul>
      )}
      <ul className="grid gap-2 sm:grid-cols-2">
        {cautionsFor(request).map((c) => (
          <li key={c.id} className="rounded-md border border-paper-deep bg-white px-4 py-3">
            <p className="font-bold">{c.title}</p>
            <p className="text-sm">{c.text}</p>
          </li>
        ))}
      </ul>
    </section>
  );
});
