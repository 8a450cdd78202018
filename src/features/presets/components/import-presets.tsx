import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { exportPresets, useImportPresets } from '../api/transfer-presets';

const outcomeWords = { added: 'added', renamed: 'added under a new name', refused: 'refused' } as const;

/** Export the team's presets as one file; import such a file, with the report of each preset. */
export function ImportPresets({ teamId, canImport }: { teamId: string; canImport: boolean }) {
  const [file, setFile] = useState<File | null>(null);
  const [exportError, setExportError] = useState<string | null>(null);
  const importer = useImportPresets(teamId);
  const report = importer.data;
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-3">
        <Button variant="quiet" onClick={() => exportPresets(teamId).catch((e: Error) => setExportError(e.message))}>
          Export all presets
        </Button>
        {canImport && (
          <>
            <label className="text-sm">
              <span className="sr-only">Presets file</span>
              <input
                type="file"
                accept="application/json,.json"
                onChange={(e) => setFile(e.target.files?.[0] ?? null)}
              />
            </label>
            <Button disabled={!file || importer.isPending} onClick={() => file && importer.mutate(file)}>
              Import file
            </Button>
          </>
        )}
      </div>
      {exportError && <Notice tone="error">{exportError}</Notice>}
      {importer.error && <Notice tone="error">{importer.error.message}</Notice>}
      {report && (
        <Notice tone={report.written ? 'success' : 'error'}>
          <p className="font-medium">
            {report.written
              ? `Imported ${report.added + report.renamed} presets${report.renamed ? ` (${report.renamed} renamed because the name was taken)` : ''}.`
              : `Nothing was imported: ${report.refused} of ${report.items.length} presets were refused. Fix them and import the file again.`}
          </p>
          <ul className="mt-2 list-disc pl-5 text-sm">
            {report.items.map((i) => (
              <li key={i.index}>
                #{i.index + 1} “{i.name || 'no name'}”: {outcomeWords[i.outcome]}
                {i.savedAs && i.savedAs !== i.name && ` as “${i.savedAs}”`}
                {i.reason && ` — ${i.reason}`}
                {i.notes.map((n) => ` (${n})`)}
              </li>
            ))}
          </ul>
        </Notice>
      )}
    </div>
  );
}
