// `npm start`: install what is missing, start the local PostgreSQL, migrate, seed, build, serve.
import { spawn } from 'node:child_process';
import { bootstrap } from './lib/bootstrap.mjs';
import { appDatabase } from './lib/db-settings.mjs';
import { runDbCli } from './lib/run-db-cli.mjs';
import { buildClient } from './lib/build-client.mjs';
import { root } from './lib/paths.mjs';
import { say } from './lib/log.mjs';

const databaseUrl = await bootstrap(appDatabase);
runDbCli('migrate', databaseUrl);
runDbCli('seed', databaseUrl);
buildClient();

const host = process.env.HOST ?? '127.0.0.1';
const port = process.env.PORT ?? '3000';
const server = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
  cwd: root,
  stdio: ['inherit', 'inherit', 'inherit', 'ipc'],
  env: {
    ...process.env,
    NODE_ENV: process.env.NODE_ENV ?? 'production',
    DATABASE_URL: databaseUrl,
    HOST: host,
    PORT: port,
  },
});

server.on('message', (message) => {
  if (message?.type !== 'listening') return;
  say(`Seamwright is ready at http://${host}:${port}`);
  say('demo studio: Quillmoss Prop Studio (an invented scenario)');
  say('Ctrl-C stops the server; PostgreSQL keeps running for the next start (npm run db:stop stops it).');
});

// Ctrl-C reaches the server too (same process group); we just wait for it to finish cleanly.
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => server.kill(signal));
}
server.on('exit', (code, signal) => process.exit(code ?? (signal ? 0 : 1)));
