/**
 * npm run user:create -- --email E --role admin [--name "Full Name"] [--password P]
 * Creates a staff account from the command line (the first admin, typically).
 * Without --password a strong one is generated and printed once.
 */
import { parseArgs } from 'node:util';
import { randomBytes } from 'node:crypto';
import { createUserBodySchema } from '#shared/schemas/users.ts';
import { connect } from '#server/connect.ts';
import { systemCaller } from '#server/core/caller.ts';
import { AppError } from '#server/core/app-error.ts';

async function main(): Promise<number> {
  const { values } = parseArgs({
    options: {
      email: { type: 'string' },
      role: { type: 'string', default: 'admin' },
      name: { type: 'string' },
      password: { type: 'string' },
    },
  });
  const generated = !values.password;
  const password = values.password ?? randomBytes(15).toString('base64url');
  const parsed = createUserBodySchema.safeParse({
    email: values.email,
    role: values.role,
    displayName: values.name ?? values.email?.split('@')[0] ?? '',
    password,
  });
  if (!parsed.success) {
    console.error('Cannot create the user:');
    for (const i of parsed.error.issues) console.error(`  --${i.path.join('.')}: ${i.message}`);
    console.error('usage: npm run user:create -- --email E --role tester|editor|admin [--name N] [--password P]');
    return 2;
  }
  const body = parsed.data;
  const app = await connect();
  try {
    // The same service the admin page uses, so the audit row is the same whoever creates a user.
    const user = await app.services.users.create(systemCaller('cli'), body);
    console.log(`Created ${user.role} ${user.email} (id ${user.id}).`);
    if (generated) console.log(`Password (shown once): ${password}`);
    return 0;
  } catch (err) {
    if (err instanceof AppError && err.code === 'email_taken') {
      console.error(`An account with the e-mail ${body.email} already exists.`);
      return 1;
    }
    throw err;
  } finally {
    await app.close();
  }
}

main().then(
  (code) => (process.exitCode = code),
  (err: unknown) => {
    console.error(err instanceof Error ? err.message : err);
    process.exitCode = 1;
  },
);
