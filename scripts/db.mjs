// npm run db:start | db:stop | db:migrate | db:seed | db:reset [--yes]
//         | db:backup -- FILE [--database NAME] | db:restore -- FILE [--yes] [--database NAME]
import { createInterface } from 'node:readline/promises';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { bootstrap } from './lib/bootstrap.mjs';
import { appDatabase } from './lib/db-settings.mjs';
import { ensureServerBinaries, stopCluster } from './lib/postgres.mjs';
import { backupDatabase, restoreDatabase } from './lib/backup.mjs';
import { runDbCli } from './lib/run-db-cli.mjs';
import { fail, say } from './lib/log.mjs';

async function confirm({ question, word, refusal }) {
  if (process.argv.includes('--yes')) return;
  if (!process.stdin.isTTY) fail(refusal);
  const rl = createInterface({ input: process.stdin, output: process.stderr });
  const answer = await rl.question(`${question} Type "${word}" to go on: `);
  rl.close();
  if (answer.trim() !== word) fail('nothing was changed.');
}

// `npm run` starts scripts in the project folder; a relative FILE means the folder the command was typed in.
function fileArgument(positionals, usage) {
  if (positionals.length !== 1) fail(`usage: ${usage}`);
  const typedIn = process.env.npm_lifecycle_event?.startsWith('db:') ? process.env.INIT_CWD : undefined;
  return path.resolve(typedIn ?? process.cwd(), positionals[0]);
}

function fileOptions(usage) {
  try {
    const { values, positionals } = parseArgs({
      args: process.argv.slice(3),
      options: { yes: { type: 'boolean' }, database: { type: 'string' } },
      allowPositionals: true,
    });
    return { file: fileArgument(positionals, usage), database: values.database ?? appDatabase };
  } catch (error) {
    return fail(`${error.message}\nusage: ${usage}`);
  }
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
    await confirm({
      question: `This deletes ALL data in the "${appDatabase}" database.`,
      word: 'reset',
      refusal: 'db:reset wipes every saved preset and account; run `npm run db:reset -- --yes` to confirm.',
    });
    runDbCli('reset', await bootstrap(appDatabase));
    say('database reset: migrated and seeded afresh.');
    break;
  }
  case 'backup': {
    const { file, database } = fileOptions('npm run db:backup -- FILE [--database NAME]');
    await backupDatabase(file, database);
    break;
  }
  case 'restore': {
    const { file, database } = fileOptions('npm run db:restore -- FILE --yes [--database NAME]');
    await restoreDatabase(file, database, {
      confirm: () =>
        confirm({
          question: `This replaces ALL data in the "${database}" database with ${file}.`,
          word: 'restore',
          refusal:
            `db:restore replaces every saved preset and account in "${database}" with the backup; ` +
            'run `npm run db:restore -- FILE --yes` to confirm.',
        }),
    });
    break;
  }
  default:
    fail(`unknown command "${command}"; use start, stop, migrate, seed, reset, backup or restore.`);
}
