import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useVersions } from '../api/get-versions';
import { useRestoreVersion } from '../api/restore-version';

interface Props {
  teamId: string;
  presetId: string;
  currentVersion: number;
  canEdit: boolean;
}

/** Every version, newest first, with what changed in plain words; editors restore any of them as a new version. */
export function PresetVersions({ teamId, presetId, currentVersion, canEdit }: Props) {
  const { data, isPending, error } = useVersions(teamId, presetId);
  const restore = useRestoreVersion(teamId, presetId);
  if (isPending) return <Notice>Loading versions…</Notice>;
  if (error) return <Notice tone="error">{error.message}</Notice>;
  return (
    <div className="space-y-3">
      {restore.error && <Notice tone="error">{restore.error.message}</Notice>}
      <ol className="space-y-3">
        {data.items.map((v) => (
          <li key={v.version} className="rounded-card border border-paper-deep p-3">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <p className="font-medium">
                Version {v.version}
                {v.version === currentVersion && ' (current)'} · {new Date(v.createdAt).toLocaleString()} ·{' '}
                {v.author?.name ?? 'a former member'}
              </p>
              {canEdit && v.version !== currentVersion && (
                <Button
                  variant="quiet"
                  disabled={restore.isPending}
                  onClick={() => restore.mutate({ version: v.version, baseVersion: currentVersion })}
                >
                  Restore version {v.version} as version {currentVersion + 1}
                </Button>
              )}
            </div>
            <ul className="mt-1 list-disc pl-5 text-sm text-ink-soft">
              {v.changes.map((c) => (
                <li key={c}>{c}</li>
              ))}
            </ul>
          </li>
        ))}
      </ol>
    </div>
  );
}
