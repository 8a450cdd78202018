// `npm start`: install what is missing, start the local PostgreSQL, migrate, seed, build, serve.
import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { bootstrap } from './lib/bootstrap.mjs';
import { appDatabase } from './lib/db-settings.mjs';
import { runDbCli } from './lib/run-db-cli.mjs';
import { buildClient } from './lib/build-client.mjs';
import { root } from './lib/paths.mjs';
import { say } from './lib/log.mjs';

const databaseUrl = await bootstrap(appDatabase);
runDbCli('migrate', databaseUrl);
runDbCli('seed', databaseUrl);

const host = process.env.HOST ?? '127.0.0.1';
const port = process.env.PORT ?? '3000';
// This is the local demo: mail goes to the catcher inside the server, and the client build keeps
// its outbox page (a plain `npm run build` for a real deployment leaves it out).
const mailCatcher = process.env.MAIL_CATCHER ?? (process.env.SMTP_HOST ? 'off' : 'on');
if (mailCatcher === 'on') process.env.VITE_DEV_OUTBOX = '1';
buildClient();
const server = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
  cwd: root,
  stdio: ['inherit', 'inherit', 'inherit', 'ipc'],
  env: {
    ...process.env,
    NODE_ENV: process.env.NODE_ENV ?? 'production',
    DATABASE_URL: databaseUrl,
    HOST: host,
    PORT: port,
    APP_URL: process.env.APP_URL ?? `http://${host}:${port}`,
    MAIL_CATCHER: mailCatcher,
  },
});

server.on('message', (message) => {
  if (message?.type !== 'listening') return;
  say(`Seamwright is ready at http://${host}:${port}`);
  say('demo studio: Quillmoss Prop Studio (an invented scenario); sign in as any of:');
  const demo = JSON.parse(readFileSync(path.join(root, 'server/db/seed/demo-accounts.json'), 'utf8'));
  for (const person of demo.people) say(`  ${person.role.padEnd(6)}  ${person.email}  (${person.name})`);
  say(`  password for all three: ${demo.password}`);
  if (mailCatcher === 'on') say(`e-mails are caught locally, not sent: read them at http://${host}:${port}/dev/outbox`);
  say('Ctrl-C stops the server; PostgreSQL keeps running for the next start (npm run db:stop stops it).');
});

// Ctrl-C reaches the server too (same process group); we just wait for it to finish cleanly.
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => server.kill(signal));
}
server.on('exit', (code, signal) => process.exit(code ?? (signal ? 0 : 1)));
