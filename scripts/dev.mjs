// `npm run dev`: the API in watch mode on API_PORT (3001) and Vite with hot reload on 5173,
// which proxies /api to it. Ctrl-C stops both; PostgreSQL keeps running.
import { spawn } from 'node:child_process';
import { bootstrap } from './lib/bootstrap.mjs';
import { appDatabase } from './lib/db-settings.mjs';
import { runDbCli } from './lib/run-db-cli.mjs';
import { root } from './lib/paths.mjs';
import { say } from './lib/log.mjs';

const databaseUrl = await bootstrap(appDatabase);
runDbCli('migrate', databaseUrl);
runDbCli('seed', databaseUrl);

const apiPort = process.env.API_PORT ?? '3001';
// Links in e-mails point at Vite; the mail catcher runs inside the API (MAIL_CATCHER defaults to on).
const env = {
  ...process.env,
  NODE_ENV: 'development',
  DATABASE_URL: databaseUrl,
  PORT: apiPort,
  API_PORT: apiPort,
  APP_URL: process.env.APP_URL ?? 'http://127.0.0.1:5173',
};
const children = [
  spawn(process.execPath, ['--import', 'tsx', '--watch', 'server/index.ts'], { cwd: root, stdio: 'inherit', env }),
  spawn(process.execPath, ['node_modules/vite/bin/vite.js'], { cwd: root, stdio: 'inherit', env }),
];
say('open http://127.0.0.1:5173 (Vite, hot reload); the API listens on port ' + apiPort);
say('e-mails are caught locally: http://127.0.0.1:5173/dev/outbox');

for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => children.forEach((child) => child.kill(signal)));
}
let running = children.length;
children.forEach((child) => child.on('exit', () => --running === 0 && process.exit(0)));
