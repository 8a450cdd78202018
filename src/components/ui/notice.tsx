import type { ReactNode } from 'react';

const tones = {
  info: 'border-ink-faint bg-paper-deep text-ink',
  success: 'border-moss bg-moss-pale text-ink',
  warning: 'border-caution bg-caution-pale text-ink',
  error: 'border-kiln bg-kiln-pale text-ink',
} as const;

/** A boxed message; errors are announced as alerts, the rest politely. */
export function Notice({ tone = 'info', children }: { tone?: keyof typeof tones; children: ReactNode }) {
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`rounded-md border-l-4 px-4 py-3 ${tones[tone]}`}>
      {children}
    </div>
  );
}
