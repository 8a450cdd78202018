import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';

/** A message the local catcher received. */
export interface CapturedMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  receivedAt: string;
}

export interface MailCatcher {
  host: string;
  port: number;
  /** Newest first. */
  messages(): CapturedMail[];
  close(): Promise<void>;
}

// Enough for a day of local clicking; older messages fall off so memory stays bounded.
const KEEP = 200;
const MAX_MESSAGE_BYTES = 1_000_000;

/**
 * A local SMTP server for development and tests: accepts every message on 127.0.0.1, parses it and
 * keeps it in memory. Nothing is relayed anywhere. Port 0 picks a free port.
 */
export async function startMailCatcher(port = 0, host = '127.0.0.1'): Promise<MailCatcher> {
  const store: CapturedMail[] = [];
  let nextId = 1;
  const server = new SMTPServer({
    secure: false,
    logger: false,
    // Loopback only and no relaying, so no authentication or TLS is needed.
    disabledCommands: ['AUTH', 'STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          store.unshift({
            id: nextId++,
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: parsed.html || '',
            receivedAt: new Date().toISOString(),
          });
          store.length = Math.min(store.length, KEEP);
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  const address = server.server.address();
  const actualPort = typeof address === 'object' && address ? address.port : port;
  return {
    host,
    port: actualPort,
    messages: () => [...store],
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
