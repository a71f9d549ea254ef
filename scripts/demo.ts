/**
 * npm run demo: the whole app with demo data on this machine. Starts the project's
 * PostgreSQL (unless DATABASE_URL is set), migrates, seeds the demo accounts, writes the demo
 * instrument exports to demo-data/, builds the client and
 * runs the web server (API and pages) with the worker beside it, a local fake SMTP server
 * (127.0.0.1:BENCHLIGHT_SMTP_PORT, default 2525) that keeps every e-mail as an .eml file in
 * .data/mail/ — admins read them on the lab's Mailbox page — and the local fake payment provider
 * in this process (unless PAYMENTS_SECRET_KEY is set: then the provider it names).
 * Ctrl-C stops them all; `npm run db:stop` stops PostgreSQL.
 */
import { spawn } from 'node:child_process';
import path from 'node:path';
import { start } from '#server/db/embedded-postgres.ts';
import { resolveDatabaseUrl } from '#server/db/database-url.ts';
import { startFakeSmtp } from '#server/mail/fake-smtp.ts';
import { DEMO_USERS } from '#seeds/data/demo-users.ts';
import { buildClient, knexCli, runStep, ROOT, seedDemoData } from './lib/run-step.ts';
import { fakePaymentsEnv, LOCAL_FAKE_PAYMENTS, startLocalFakePayments } from './lib/local-fake-payments.ts';

async function main() {
  if (process.env.NODE_ENV === 'production') throw new Error('The demo does not run with NODE_ENV=production.');
  if (!process.env.DATABASE_URL) {
    console.log('▶ PostgreSQL (embedded, 127.0.0.1)');
    await start();
  }
  const databaseUrl = resolveDatabaseUrl();
  knexCli('Migrate', ['migrate:latest'], databaseUrl);
  seedDemoData('Seed the demo data', databaseUrl);
  runStep('Write the demo exports to demo-data/ (try them with the bench CLI)', process.execPath, [
    '--import', 'tsx', path.join(ROOT, 'scripts', 'make-demo-data.ts'), '--out', path.join(ROOT, 'demo-data'),
  ]);
  buildClient();

  const smtpPort = Number(process.env.BENCHLIGHT_SMTP_PORT ?? 2525);
  const mailDir = path.join(ROOT, '.data', 'mail');
  const smtp = await startFakeSmtp({ dir: mailDir, port: smtpPort }).catch((err: NodeJS.ErrnoException) => {
    throw new Error(
      err.code === 'EADDRINUSE' ? `Port ${smtpPort} is in use: stop the other program or set BENCHLIGHT_SMTP_PORT=<port>.` : `The local mail server could not start: ${err.message}`,
    );
  });
  console.log(`▶ Local mail server on ${smtp.url}: every e-mail is kept in ${path.relative(ROOT, mailDir)}/ (Mailbox page for admins)`);

  console.log('\nDemo accounts:');
  for (const u of DEMO_USERS) console.log(`  ${u.role.padEnd(7)} ${u.email}  /  ${u.password}`);
  console.log('');
  // Payments go to the local fake (its state kept in .data/, so a restarted demo keeps its
  // checkouts and balance), unless real provider keys were given.
  const fake = process.env.PAYMENTS_SECRET_KEY
    ? null
    : await startLocalFakePayments({
        port: LOCAL_FAKE_PAYMENTS.port,
        webhookUrl: `http://127.0.0.1:${process.env.PORT ?? 3000}/api/payments/webhook`,
        webhookSecret: LOCAL_FAKE_PAYMENTS.webhookSecret,
        dataFile: LOCAL_FAKE_PAYMENTS.dataFile,
      });
  if (fake) console.log(`Fake payment provider (local test, no money moves): ${fake.url}  ·  its events: ${fake.url}/__fake/events\n`);
  // Request logs stay quiet in the demo unless LOG_LEVEL asks for them.
  // Both send through the fake SMTP server: the web server only records e-mails, the worker delivers them.
  const env = {
    ...process.env,
    SERVE_CLIENT: 'true',
    DATABASE_URL: databaseUrl,
    LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn',
    ...(fake ? fakePaymentsEnv(fake, LOCAL_FAKE_PAYMENTS.webhookSecret) : {}),
    SMTP_URL: smtp.url,
    FAKE_MAILBOX_DIR: smtp.dir,
  };
  // The worker runs the queued jobs (file analysis); the web server serves the API and the pages.
  const worker = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'server', 'worker.ts')], { cwd: ROOT, stdio: 'inherit', env });
  const server = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'server', 'main.ts')], { cwd: ROOT, stdio: 'inherit', env });
  const children = [worker, server];
  const forward = (signal: NodeJS.Signals) => children.forEach((c) => c.kill(signal));
  process.on('SIGINT', forward);
  process.on('SIGTERM', forward);
  // When either stops, stop the other and leave with its code; the fake stops with the last.
  for (const c of children) {
    c.on('exit', (code) => {
      for (const other of children) if (other !== c && other.exitCode === null) other.kill('SIGTERM');
      process.exitCode = code ?? 0;
      if (children.every((x) => x.exitCode !== null || x.signalCode !== null)) {
        void fake?.close();
        void smtp.close();
      }
    });
  }
}

main().catch((err: unknown) => {
  console.error(`\n✖ ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
