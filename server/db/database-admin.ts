import pg from 'pg';

/** Creating and dropping whole databases, for tools and tests (never the running app). */
const SAFE_NAME = /^[a-z_][a-z0-9_]*$/;

function split(url: string): { name: string; adminUrl: string } {
  const u = new URL(url);
  const name = decodeURIComponent(u.pathname.slice(1));
  if (!SAFE_NAME.test(name)) throw new Error(`Refusing to manage a database named "${name}".`);
  u.pathname = '/postgres';
  return { name, adminUrl: u.toString() };
}

async function onServer<T>(adminUrl: string, fn: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

/** Creates the database the URL names unless it exists. */
export async function ensureDatabase(url: string): Promise<void> {
  const { name, adminUrl } = split(url);
  await onServer(adminUrl, async (client) => {
    const found = await client.query('select 1 from pg_database where datname = $1', [name]);
    if (found.rowCount === 0) await client.query(`create database "${name}"`);
  });
}

/** Drops the database the URL names, ending its connections first. */
export async function dropDatabase(url: string): Promise<void> {
  const { name, adminUrl } = split(url);
  await onServer(adminUrl, (client) => client.query(`drop database if exists "${name}" with (force)`));
}
