import type { Knex } from 'knex';

// Who did what to which record, when, with a before/after summary. Rows are never updated.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('audit_log', (t) => {
    t.bigIncrements('id').primary();
    t.text('actor_user_id').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.text('actor_label').notNullable();
    t.text('action').notNullable();
    t.text('entity_type').notNullable();
    t.text('entity_id').nullable();
    t.jsonb('before').nullable();
    t.jsonb('after').nullable();
    t.text('request_id').nullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['entity_type', 'entity_id']);
    t.index(['created_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('audit_log');
}
