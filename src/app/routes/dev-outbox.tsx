import { OutboxList } from '../../features/dev-outbox/components/outbox-list';

/** Development only: the messages the local mail catcher received instead of sending them. */
export function DevOutboxRoute() {
  return (
    <section className="max-w-3xl space-y-6">
      <h1 className="text-title font-bold">Outbox (development)</h1>
      <p className="text-ink-soft">
        In development and in the local demo, Seamwright sends no real e-mail: a mail catcher on this machine keeps
        every message here instead.
      </p>
      <OutboxList />
    </section>
  );
}
