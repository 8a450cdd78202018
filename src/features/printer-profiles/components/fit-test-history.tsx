import type { FitTest } from '../../../../shared/schemas/fit-test';
import { formatMm } from '../../../../shared/fit/format-mm';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useFitTests } from '../api/fit-tests';
import { useMakeFitTestCurrent } from '../api/make-fit-test-current';

const results = (t: FitTest) =>
  (['press', 'snug', 'slide'] as const)
    .flatMap((fit) => {
      const r = t.results[fit];
      return r ? [`${fit} ${formatMm(r.clearancePerSide)} (${formatMm(r.offsetMm, true)})`] : [];
    })
    .join('; ') || 'no fit found';

/** Earlier fit tests of one printer, newest first; editors can make an older one current again. */
export function FitTestHistory({
  teamId,
  profileId,
  canEdit,
}: {
  teamId: string;
  profileId: string;
  canEdit: boolean;
}) {
  const { data, isPending, error } = useFitTests(teamId, profileId);
  const makeCurrent = useMakeFitTestCurrent(teamId, profileId);
  return (
    <section aria-labelledby="fit-test-history" className="space-y-3">
      <h2 id="fit-test-history" className="text-lead font-bold">
        Earlier tests
      </h2>
      {isPending && <p>Loading…</p>}
      {error && <Notice tone="error">The earlier tests could not be loaded: {error.message}</Notice>}
      {makeCurrent.error && <Notice tone="error">{makeCurrent.error.message}</Notice>}
      {data && data.items.length === 0 && <p className="text-ink-soft">No fit tests recorded for this printer yet.</p>}
      {data && data.items.length > 0 && (
        <table className="w-full border-collapse text-left" data-testid="fit-test-history">
          <caption className="sr-only">Fit tests of this printer</caption>
          <thead>
            <tr className="border-b border-ink-faint">
              <th scope="col" className="py-2 pr-4">
                Date
              </th>
              <th scope="col" className="py-2 pr-4">
                Material
              </th>
              <th scope="col" className="py-2 pr-4">
                Range
              </th>
              <th scope="col" className="py-2 pr-4">
                Result (difference from default)
              </th>
              <th scope="col" className="py-2 pr-4">
                By
              </th>
              <th scope="col" className="py-2">
                <span className="sr-only">Status</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {data.items.map((t) => (
              <tr key={t.id} className="border-b border-ink-faint">
                <td className="py-2 pr-4">{new Date(t.createdAt).toLocaleDateString()}</td>
                <td className="py-2 pr-4">{t.material}</td>
                <td className="py-2 pr-4">
                  {formatMm(t.coupon.clearanceFrom)} to {formatMm(t.coupon.clearanceTo)}, step{' '}
                  {formatMm(t.coupon.clearanceStep)}
                </td>
                <td className="py-2 pr-4">{results(t)}</td>
                <td className="py-2 pr-4">{t.createdBy?.name ?? '—'}</td>
                <td className="py-2">
                  {t.current ? (
                    <span className="font-medium">Current for {t.material}</span>
                  ) : canEdit ? (
                    <Button
                      variant="quiet"
                      disabled={makeCurrent.isPending}
                      onClick={() => makeCurrent.mutate(t.id)}
                      aria-label={`Make current the ${t.material} test of ${new Date(t.createdAt).toLocaleString()}`}
                    >
                      Make current
                    </Button>
                  ) : (
                    'earlier'
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
