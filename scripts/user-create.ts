/**
 * npm run user:create -- --email E --role admin [--name "Full Name"] [--password P]
 * Creates a staff account from the command line (the first admin, typically).
 * Without --password a strong one is generated and printed once.
 */
import { parseArgs } from 'node:util';
import { randomBytes, randomUUID } from 'node:crypto';
import { z } from 'zod';
import { createUserBodySchema } from '../shared/schemas/users.ts';
import { hashPassword } from '../server/auth/password.ts';
import { resolveDatabaseUrl } from '../server/db/database-url.ts';
import { createDb, closeDb } from '../server/db/knex.ts';
import { usersRepo } from '../server/db/repos/users-repo.ts';
import { auditRepo } from '../server/db/repos/audit-repo.ts';

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
  const db = createDb(resolveDatabaseUrl(), () => {});
  try {
    const user = await db.knex.transaction(async (trx) => {
      if (await usersRepo.emailExists(trx, body.email)) return null;
      const u = await usersRepo.insert(trx, { id: randomUUID(), ...body, passwordHash: await hashPassword(body.password), now: new Date() });
      await auditRepo.insert(trx, {
        actorUserId: null, actorLabel: 'command line', action: 'user.create', entityType: 'user', entityId: u.id,
        after: { email: u.email, role: u.role }, at: new Date(),
      });
      return u;
    });
    if (!user) {
      console.error(`An account with the e-mail ${body.email} already exists.`);
      return 1;
    }
    console.log(`Created ${user.role} ${user.email} (id ${user.id}).`);
    if (generated) console.log(`Password (shown once): ${password}`);
    return 0;
  } finally {
    await closeDb(db);
  }
}

main().then(
  (code) => (process.exitCode = code),
  (err: unknown) => {
    console.error(err instanceof z.ZodError ? err.message : err);
    process.exitCode = 1;
  },
);
