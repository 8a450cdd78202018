import { useState, memo } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { KitRequest } from '../../../../shared/schemas/kit-request';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useDownloadKit, type KitOrigin } from '../api/download-kit';
import { useCurrentTeam } from '../../../lib/session';
import type { PreviewKit } from '../lib/preview-kit';
import { saveFile } from '../lib/save-file';

const roleWords = {
  key: 'Key',
  'pocket-cutter': 'Pocket cutter',
  rail: 'Rails',
  'slot-cutter': 'Slot cutter',
} as const;

/** Size of a binary STL: an 80-byte header, a 4-byte count, 50 bytes per triangle. */
const stlBytes = (triangles: number) => 84 + 50 * triangles;
const kb = (bytes: number) => `${Math.max(1, Math.round(bytes / 1024))} kB`;

interface KitDownloadsProps {
  /** The request the form describes now; null while it has errors. */
  request: KitRequest | null;
  kit: PreviewKit | null;
  /** The newest build failed: nothing to download until it is fixed. */
  blocked: boolean;
  stl: (file: string) => Promise<Uint8Array>;
  /** The preset and printer profile a signed-in download is recorded with. */
  origin?: KitOrigin;
}

/** What is in the kit, file by file, and the downloads: the whole zip from the server, or one STL. */
export const KitDownloads = memo(function KitDownloads({ request, kit, blocked, stl, origin }: KitDownloadsProps) {
  const zip = useDownloadKit();
  const { team } = useCurrentTeam();
  const [partError, setPartError] = useState<string | null>(null);
  const [staleNote, setStaleNote] = useState<string | null>(null);
  const queryClient = useQueryClient();
  const ready = Boolean(request && kit && !blocked);
  const binary = kit?.manifest.request.format !== 'ascii';
  return (
    <section aria-labelledby="kit-title" className="space-y-3">
      <h2 id="kit-title" className="text-lead font-bold">
        What’s in the kit
      </h2>
      {!ready && <p className="text-ink-soft">Fix the marked settings to see the files and download them.</p>}
      {ready && kit && (
        <>
          <ul
            className="divide-y divide-paper-deep rounded-card border border-ink-faint bg-white"
            data-testid="kit-files"
          >
            {kit.manifest.parts.map((part) => (
              <li key={part.file} className="flex flex-wrap items-start justify-between gap-3 px-4 py-3">
                <div className="min-w-0 flex-1 basis-64">
                  <p className="font-mono font-semibold break-all">{part.file}</p>
                  <p className="text-sm text-ink-soft">
                    {roleWords[part.role]}
                    {part.half ? ` · half ${part.half}` : ''}
                    {part.role === 'key' ? ` · print ${part.quantity}` : ''} · {part.triangles} triangles
                    {binary ? ` · about ${kb(stlBytes(part.triangles))}` : ''}
                  </p>
                  <p className="text-sm">{part.note}</p>
                </div>
                <Button
                  variant="quiet"
                  aria-label={`Download ${part.file} on its own`}
                  onClick={async () => {
                    setPartError(null);
                    try {
                      const bytes = await stl(part.file);
                      saveFile(new Blob([bytes as Uint8Array<ArrayBuffer>], { type: 'model/stl' }), part.file);
                    } catch (error) {
                      setPartError(error instanceof Error ? error.message : 'The file could not be built.');
                    }
                  }}
                >
                  STL
                </Button>
              </li>
            ))}
            <li className="px-4 py-3">
              <p className="font-mono font-semibold">manifest.json</p>
              <p className="text-sm">Every number of the kit: the settings, clearance, positions and sizes, in mm.</p>
            </li>
            <li className="px-4 py-3">
              <p className="font-mono font-semibold">README.txt</p>
              <p className="text-sm">How to use each file and print the parts, in plain words.</p>
            </li>
          </ul>
          {partError && <Notice tone="error">{partError}</Notice>}
          {zip.isError && <Notice tone="error">{zip.error.message}</Notice>}
          {staleNote && <Notice tone="warning">{staleNote}</Notice>}
          <Button
            onClick={() =>
              request &&
              zip.mutate(
                { request, origin },
                {
                  onSuccess: (file) => {
                    saveFile(file.blob, file.name);
                    const shown = kit?.manifest.clearancePerSide;
                    const built = file.clearancePerSide;
                    // The server reads the printer's calibration and the team material afresh; the preview
                    // used what this page loaded. If they changed meanwhile, say so and load them again.
                    if (built === undefined || shown === undefined || Math.abs(built - shown) < 1e-9) {
                      setStaleNote(null);
                      return;
                    }
                    setStaleNote(
                      `The kit was built with ${built} mm per side, not the ${shown} mm shown here: your team’s printer calibration or material changed since this page loaded. The preview now follows the current numbers.`,
                    );
                    if (team) void queryClient.invalidateQueries({ queryKey: ['teams', team.id] });
                  },
                },
              )
            }
            disabled={zip.isPending}
            className="w-full py-3 text-lead sm:w-auto"
          >
            {zip.isPending ? 'Preparing the kit…' : 'Download the kit (.zip)'}
          </Button>
          {team && <p className="text-sm text-ink-soft">Each download is kept in the kit history of {team.name}.</p>}
        </>
      )}
    </section>
  );
});
