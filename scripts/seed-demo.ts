/**
 * npm run db:seed — writes the demo lab's data (accounts, and what later seeds add) into
 * DATABASE_URL or the project's own cluster. Refuses NODE_ENV=production.
 */
import { connect } from '#server/connect.ts';
import { seedDemo } from '#seeds/demo-seed.ts';

async function main(): Promise<void> {
  const app = await connect();
  try {
    await seedDemo(app.services);
    console.log('Demo data seeded.');
  } finally {
    await app.close();
  }
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : String(err));
  process.exitCode = 1;
});
