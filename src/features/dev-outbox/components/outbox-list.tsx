import { Fragment } from 'react';
import { Notice } from '../../../components/ui/notice';
import { useOutbox } from '../api/get-outbox';

// Links in the plain-text part become clickable; everything else stays plain text.
function Linkified({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/\S+)/g);
  return (
    <>
      {parts.map((part, i) =>
        /^https?:\/\//.test(part) ? (
          <a key={i} href={part} className="break-all text-kiln underline">
            {part}
          </a>
        ) : (
          <Fragment key={i}>{part}</Fragment>
        ),
      )}
    </>
  );
}

/** Every message the local catcher holds, newest first, refreshed every few seconds. */
export function OutboxList() {
  const { data, isPending, isError, error } = useOutbox();
  if (isPending) return <Notice>Loading the outbox…</Notice>;
  if (isError) return <Notice tone="error">{error.message}</Notice>;
  if (data.length === 0) return <Notice>No messages yet. Sign up or invite someone, and they appear here.</Notice>;
  return (
    <ul className="space-y-4">
      {data.map((m) => (
        <li key={m.id} className="rounded-card border border-paper-deep bg-white p-4">
          <h2 className="font-bold">{m.subject}</h2>
          <p className="text-sm text-ink-soft">
            To {m.to.join(', ')} · {new Date(m.receivedAt).toLocaleString()}
          </p>
          <pre className="mt-3 font-sans whitespace-pre-wrap">
            <Linkified text={m.text} />
          </pre>
        </li>
      ))}
    </ul>
  );
}
