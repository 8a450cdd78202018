import { memo } from 'react';
import type { KitManifest } from '../../../../shared/kit/kit-manifest';
import { withUnit, type LengthUnit } from '../lib/units';

/** How the clearance was chosen: the fit engine's sentence and the steps that add up to it, with sources. */
export const FitExplanation = memo(function FitExplanation({
  manifest,
  unit,
}: {
  manifest: KitManifest;
  unit: LengthUnit;
}) {
  return (
    <section aria-labelledby="fit-title" className="space-y-3">
      <h2 id="fit-title" className="text-lead font-bold">
        Why this fit
      </h2>
      <p className="text-lead" data-testid="clearance">
        Clearance per side: <strong>{withUnit(manifest.clearancePerSide, unit)}</strong>
        {manifest.keyScale !== undefined && (
          <>
            {' '}
            · keys printed at <strong>{Math.round(manifest.keyScale * 10000) / 100} %</strong>
          </>
        )}
      </p>
      <p>{manifest.fit.derivation}</p>
      {manifest.fit.steps.length > 0 && (
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Steps of the clearance</caption>
          <thead>
            <tr className="border-b border-ink-faint">
              <th scope="col" className="py-1 pr-3">
                Step
              </th>
              <th scope="col" className="py-1 pr-3 text-right">
                Amount
              </th>
              <th scope="col" className="py-1">
                Where it comes from
              </th>
            </tr>
          </thead>
          <tbody>
            {manifest.fit.steps.map((s, i) => (
              <tr key={i} className="border-b border-paper-deep align-top">
                <td className="py-1 pr-3">{s.label}</td>
                <td className="py-1 pr-3 text-right tabular-nums">{withUnit(s.mm, unit)}</td>
                <td className="py-1 text-ink-soft">{s.source}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {manifest.printNotes.length > 0 && (
        <div className="space-y-1">
          <h3 className="font-bold">Printing</h3>
          <ul className="list-disc space-y-1 pl-5">
            {manifest.printNotes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </div>
      )}
    </section>
  );
});
