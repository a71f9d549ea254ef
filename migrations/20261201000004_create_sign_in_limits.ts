import type { Knex } from 'knex';

// Counters for failed sign-ins, in the layout rate-limiter-flexible's PostgreSQL store uses,
// so several web processes share one count.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sign_in_limits', (t) => {
    t.string('key', 255).primary();
    t.integer('points').notNullable().defaultTo(0);
    t.bigInteger('expire').nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('sign_in_limits');
}
