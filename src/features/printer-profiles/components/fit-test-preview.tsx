import type { calibrationOffsets } from '../../../../shared/fit/calibration-offsets';
import type { deriveCalibration } from '../../../../shared/fit/derive-calibration';
import { formatMm } from '../../../../shared/fit/format-mm';
import { Notice } from '../../../components/ui/notice';

const fitWords = { press: 'Press', snug: 'Snug', slide: 'Slide' } as const;

/**
 * What the answers entered so far say: their contradictions, or the best clearance per fit class against the
 * published default. Announced politely as the answers change.
 */
export function FitTestPreview({
  reading,
  offsets,
  part,
}: {
  part: 'pocket' | 'slot';
  reading: ReturnType<typeof deriveCalibration> | null;
  offsets: ReturnType<typeof calibrationOffsets> | null;
}) {
  return (
    <div aria-live="polite" data-testid="fit-test-preview" className="space-y-2">
      {reading && !reading.ok && (
        <Notice tone="warning">
          <p className="font-medium">These answers contradict each other:</p>
          <ul className="list-disc pl-5">
            {reading.problems.map((p) => (
              <li key={p}>{p}</li>
            ))}
          </ul>
        </Notice>
      )}
      {offsets && (
        <>
          <table className="w-full max-w-2xl border-collapse text-left">
            <caption className="text-left font-medium">Best clearance per fit (mm per side)</caption>
            <thead>
              <tr className="border-b border-ink-faint">
                <th scope="col" className="py-2 pr-4">
                  Fit
                </th>
                <th scope="col" className="py-2 pr-4">
                  Measured
                </th>
                <th scope="col" className="py-2 pr-4">
                  Published default
                </th>
                <th scope="col" className="py-2">
                  Difference
                </th>
              </tr>
            </thead>
            <tbody>
              {(['press', 'snug', 'slide'] as const).map((fit) => {
                const r = offsets.results[fit];
                return (
                  <tr key={fit} className="border-b border-ink-faint">
                    <th scope="row" className="py-2 pr-4 font-medium">
                      {fitWords[fit]}
                    </th>
                    {r ? (
                      <>
                        <td className="py-2 pr-4">
                          {formatMm(r.clearancePerSide)} ({part} {r.mark})
                        </td>
                        <td className="py-2 pr-4">{formatMm(r.publishedDefault)}</td>
                        <td className="py-2">{formatMm(r.offsetMm, true)}</td>
                      </>
                    ) : (
                      <td colSpan={3} className="py-2 text-ink-soft">
                        not found on this coupon
                      </td>
                    )}
                  </tr>
                );
              })}
            </tbody>
          </table>
          {reading?.ok && reading.notes.length > 0 && (
            <ul className="list-disc pl-5 text-sm text-ink-soft">
              {reading.notes.map((n) => (
                <li key={n}>{n}</li>
              ))}
            </ul>
          )}
          {offsets.problems.length > 0 && (
            <Notice tone="warning">
              <ul className="list-disc pl-5">
                {offsets.problems.map((p) => (
                  <li key={p}>{p}</li>
                ))}
              </ul>
            </Notice>
          )}
        </>
      )}
    </div>
  );
}
