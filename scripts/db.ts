/**
 * npm run db:start | db:stop | db:status — the project's own PostgreSQL on 127.0.0.1.
 * With DATABASE_URL set, the app uses that database and this script starts nothing.
 */
import { EmbeddedPgError, start, status, stop } from '#server/db/embedded-postgres.ts';

const command = process.argv[2];

async function main(): Promise<number> {
  if (process.env.DATABASE_URL && command === 'start') {
    console.log('DATABASE_URL is set: using that database, no local cluster started.');
    return 0;
  }
  switch (command) {
    case 'start': {
      await start();
      const s = status();
      console.log(`PostgreSQL is running on 127.0.0.1:${s.port} (pid ${s.pid}, data in ${s.dataDir}).`);
      return 0;
    }
    case 'stop': {
      const stopped = stop();
      console.log(stopped ? 'PostgreSQL stopped.' : 'PostgreSQL was not running.');
      return 0;
    }
    case 'status': {
      const s = status();
      if (s.running) console.log(`running on 127.0.0.1:${s.port} (pid ${s.pid}, data in ${s.dataDir})`);
      else console.log(`not running (port ${s.port}${s.dataDir ? `, data in ${s.dataDir}` : ', no cluster yet'})`);
      return s.running ? 0 : 3;
    }
    default:
      console.error('usage: db.ts start|stop|status');
      return 2;
  }
}

main().then(
  (code) => (process.exitCode = code),
  (err: unknown) => {
    console.error(err instanceof EmbeddedPgError ? err.message : err);
    process.exitCode = 1;
  },
);
