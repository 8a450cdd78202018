import type { Preset } from '../../../../shared/schemas/preset';
import { Notice } from '../../../components/ui/notice';

interface Props {
  preset: Preset;
  teamName: string;
}

/**
 * What a viewer sees instead of the form: why there is nothing to edit, the preset's fields in words, and its
 * full settings as saved (the JSON the design screen and kit downloads use).
 */
export function PresetReadOnly({ preset, teamName }: Props) {
  const s = preset.settings;
  const rows: [string, string][] = [
    ['Description', preset.description || '—'],
    ['Tags', preset.tags.join(', ') || '—'],
    ['Printer profile', preset.printerProfileName ?? 'None'],
    ['Joint', `${s.joint}, ${s.material} ${s.fit}`],
  ];
  return (
    <div className="space-y-4">
      <Notice>
        You are a viewer of {teamName}: you can read this preset and use it, but only editors and owners can change it.
        Ask an owner of the team for the editor role.
      </Notice>
      <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[max-content_1fr]">
        {rows.map(([term, value]) => (
          <div key={term} className="contents">
            <dt className="font-medium">{term}</dt>
            <dd className="break-words text-ink-soft">{value}</dd>
          </div>
        ))}
      </dl>
      <details className="rounded-card border border-paper-deep p-3">
        <summary className="cursor-pointer font-medium">All settings as saved</summary>
        <pre className="mt-2 overflow-x-auto rounded-card bg-paper-deep p-4 text-sm">{JSON.stringify(s, null, 2)}</pre>
      </details>
    </div>
  );
}
