import type { Preset } from '../../../../shared/schemas/preset';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';

interface Props {
  current: Preset;
  /** A save is on its way: both ways are disabled so a second click cannot send it twice. */
  busy?: boolean;
  onLoadCurrent: () => void;
  onOverwrite: () => void;
}

/** Shown when a save was refused because someone saved a newer version meanwhile: what they saved, and the two ways on. */
export function ConflictNotice({ current, busy = false, onLoadCurrent, onOverwrite }: Props) {
  return (
    <Notice tone="warning">
      <p className="font-medium">
        {current.updatedBy?.name ?? 'Someone'} saved version {current.version} on{' '}
        {new Date(current.updatedAt).toLocaleString()} while you were editing. Your changes were not saved.
      </p>
      <p className="mt-1 text-sm">
        Version {current.version}: “{current.name}”, {current.settings.joint}, {current.settings.material}{' '}
        {current.settings.fit}
        {current.tags.length > 0 && `, tags ${current.tags.join(', ')}`}. The history below lists what changed. Saving
        yours keeps version {current.version} in the history, so either can be restored later.
      </p>
      <div className="mt-3 flex flex-wrap gap-2">
        <Button variant="quiet" disabled={busy} onClick={onLoadCurrent}>
          Discard mine and load version {current.version}
        </Button>
        <Button disabled={busy} onClick={onOverwrite}>
          Save mine as version {current.version + 1}
        </Button>
      </div>
    </Notice>
  );
}
