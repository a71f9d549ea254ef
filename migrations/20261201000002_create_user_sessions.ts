import type { Knex } from 'knex';

// Sign-in sessions, in the shape the lucia PostgreSQL adapter expects.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('user_sessions', (t) => {
    t.text('id').primary();
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.text('user_id').notNullable().references('id').inTable('users').onDelete('CASCADE');
    t.index(['user_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('user_sessions');
}
