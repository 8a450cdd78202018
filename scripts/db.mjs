// npm run db:start | db:stop | db:migrate | db:seed | db:reset [--yes]
import { createInterface } from 'node:readline/promises';
import { bootstrap } from './lib/bootstrap.mjs';
import { appDatabase } from './lib/db-settings.mjs';
import { ensureServerBinaries, stopCluster } from './lib/postgres.mjs';
import { runDbCli } from './lib/run-db-cli.mjs';
import { fail, say } from './lib/log.mjs';

async function confirmReset() {
  if (process.argv.includes('--yes')) return;
  if (!process.stdin.isTTY)
    fail('db:reset wipes every saved preset and account; run `npm run db:reset -- --yes` to confirm.');
  const rl = createInterface({ input: process.stdin, output: process.stderr });
  const answer = await rl.question(`This deletes ALL data in the "${appDatabase}" database. Type "reset" to go on: `);
  rl.close();
  if (answer.trim() !== 'reset') fail('nothing was changed.');
}

const command = process.argv[2];
switch (command) {
  case 'start':
    await bootstrap(appDatabase);
    break;
  case 'stop':
    stopCluster(ensureServerBinaries());
    break;
  case 'migrate':
  case 'seed':
    runDbCli(command, await bootstrap(appDatabase));
    break;
  case 'reset': {
    await confirmReset();
    runDbCli('reset', await bootstrap(appDatabase));
    say('database reset: migrated and seeded afresh.');
    break;
  }
  default:
    fail(`unknown command "${command}"; use start, stop, migrate, seed or reset.`);
}
