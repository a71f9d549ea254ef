/**
 * Before the browser tests: a fresh database with the demo seed, the built client, and the
 * real server (on a free 127.0.0.1 port) and worker started, with mail going to a local fake SMTP
 * server and payments to the local fake payment provider (both in this process, on loopback).
 * Chromium must exist (npm test installs it): without it this fails rather than skipping.
 */
import { randomUUID } from 'node:crypto';
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { freshDatabase } from '#scripts/lib/fresh-database.ts';
import { CHROMIUM_PATH } from '#scripts/lib/chromium.ts';
import { buildClient, knexCli, ROOT, seedDemoData } from '#scripts/lib/run-step.ts';
import { startFakeSmtp, type FakeSmtp } from '#server/mail/fake-smtp.ts';
import { startFakePaymentProvider, type FakePaymentProvider } from '#server/payments/fake-provider/start-fake-provider.ts';
import { freePort } from '#scripts/lib/free-port.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    chromiumPath: string;
    /** The folder where the local fake SMTP server writes every e-mail as an .eml file. */
    mailDir: string;
    /** The local fake payment provider the server and the worker talk to (its /__fake controls). */
    paymentsUrl: string;
  }
}

const E2E_DATABASE = 'benchlight_e2e';

async function waitHealthy(url: string, child: ChildProcess, log: () => string) {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The server exited (${child.exitCode}):\n${log()}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`The server did not become healthy within 60 s:\n${log()}`);
}

let server: ChildProcess | null = null;
let worker: ChildProcess | null = null;
let smtp: FakeSmtp | null = null;
let payments: FakePaymentProvider | null = null;

export default async function setup(project: TestProject) {
  if (!fs.existsSync(CHROMIUM_PATH)) {
    throw new Error(
      `Chromium not found at ${CHROMIUM_PATH}: the browser tests cannot run. ` +
        'Run "npm test" (it installs Chromium as root) or: apt-get install -y chromium',
    );
  }
  const databaseUrl = await freshDatabase(E2E_DATABASE, process.env.E2E_DATABASE_URL);
  knexCli('Migrate the browser-test database', ['migrate:latest'], databaseUrl);
  seedDemoData('Seed the browser-test database', databaseUrl);
  if (!fs.existsSync(path.join(ROOT, 'dist', 'index.html'))) {
    buildClient('Build the client');
  }

  const port = await freePort();
  // E-mail goes to a local fake SMTP server, as in the demo; tests read its folder.
  smtp = await startFakeSmtp({ dir: fs.mkdtempSync(path.join(os.tmpdir(), 'benchlight-e2e-mail-')) });
  const mailEnv = { SMTP_URL: smtp.url, FAKE_MAILBOX_DIR: smtp.dir, PUBLIC_BASE_URL: `http://127.0.0.1:${port}` };
  // Payments go to the local fake, as in the demo: it delivers signed webhooks to the server.
  const secretKey = `sk_test_${randomUUID().replaceAll('-', '')}`;
  const webhookSecret = `whsec_${randomUUID().replaceAll('-', '')}`;
  payments = await startFakePaymentProvider({ host: '127.0.0.1', webhookUrl: `http://127.0.0.1:${port}/api/payments/webhook`, webhookSecret, secretKey });
  const paymentEnv = { PAYMENTS_API_URL: payments.url, PAYMENTS_SECRET_KEY: secretKey, PAYMENTS_WEBHOOK_SECRET: webhookSecret };
  let output = '';
  server = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'server', 'main.ts')], {
    cwd: ROOT,
    env: { ...process.env, NODE_ENV: 'test', PORT: String(port), HOST: '127.0.0.1', DATABASE_URL: databaseUrl, SERVE_CLIENT: 'true', LOG_LEVEL: 'warn', ...mailEnv, ...paymentEnv },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  server.stdout?.on('data', (d) => (output += d));
  server.stderr?.on('data', (d) => (output += d));
  // The worker analyses uploads, sends mail and refunds pledges, as in production.
  worker = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'server', 'worker.ts')], {
    cwd: ROOT,
    env: { ...process.env, NODE_ENV: 'test', DATABASE_URL: databaseUrl, LOG_LEVEL: 'warn', ...mailEnv, ...paymentEnv },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  worker.stdout?.on('data', (d) => (output += d));
  worker.stderr?.on('data', (d) => (output += d));
  const baseUrl = `http://127.0.0.1:${port}`;
  await waitHealthy(baseUrl, server, () => output);

  project.provide('baseUrl', baseUrl);
  project.provide('chromiumPath', CHROMIUM_PATH);
  project.provide('mailDir', smtp.dir);
  project.provide('paymentsUrl', payments.url);

  return async () => {
    for (const child of [server, worker]) {
      if (child && child.exitCode === null) {
        child.kill('SIGTERM');
        await new Promise((r) => child.once('exit', r));
      }
    }
    await payments?.close();
    if (smtp) {
      await smtp.close();
      fs.rmSync(smtp.dir, { recursive: true, force: true });
    }
  };
}
