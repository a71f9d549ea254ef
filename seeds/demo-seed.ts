/**
 * The demo lab's data, written through the services like any other change (so the audit log
 * reads the same as for real work). Safe to run twice: existing records are brought back to
 * the demo's values. Never in production: the accounts have published passwords.
 */
import { systemCaller } from '#server/core/caller.ts';
import type { Services } from '#server/services/index.ts';
import { DEMO_USERS } from './data/demo-users.ts';
import { seedDemoLab } from './demo-lab.ts';

export async function seedDemo(services: Services, env: Record<string, string | undefined> = process.env): Promise<void> {
  if (env.NODE_ENV === 'production') {
    throw new Error('The demo seed refuses to run with NODE_ENV=production: it creates accounts with published passwords.');
  }
  const seed = systemCaller('seed');
  for (const u of DEMO_USERS) {
    const id = await services.users.findIdByEmail(seed, u.email);
    if (id === null) {
      await services.users.create(seed, { email: u.email, displayName: u.displayName, role: u.role, password: u.password });
    } else {
      await services.users.update(seed, id, { displayName: u.displayName, role: u.role, active: true });
      await services.users.setPassword(seed, id, u.password);
    }
  }
  const person = async (role: 'tester' | 'editor') => {
    const u = DEMO_USERS.find((x) => x.role === role)!;
    const id = (await services.users.findIdByEmail(seed, u.email))!;
    return { id, email: u.email, displayName: u.displayName, role };
  };
  await seedDemoLab(services, { tester: await person('tester'), editor: await person('editor') });
}
