import type { CapturedMail } from '../../server/mail/catcher';

/** Reads captured mail, waiting briefly for messages that are sent after the reply. */
export function mailbox(messages: () => CapturedMail[]) {
  return {
    all: messages,
    async waitFor(to: string, subject: RegExp, timeoutMs = 5_000): Promise<CapturedMail> {
      const until = Date.now() + timeoutMs;
      for (;;) {
        const match = messages().find(
          (m) => m.to.some((a) => a.toLowerCase() === to.toLowerCase()) && subject.test(m.subject),
        );
        if (match) return match;
        if (Date.now() > until) throw new Error(`no mail to ${to} with a subject matching ${subject}`);
        await new Promise((r) => setTimeout(r, 25));
      }
    },
  };
}
