import type { Knex } from 'knex';

// Readers who asked for new-report e-mails. One row per address whatever its letter case; only
// confirmed rows receive reports. Topics: every report, or chosen model categories.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('subscribers', (t) => {
    t.text('id').primary();
    t.text('email').notNullable();
    t.text('status').notNullable().defaultTo('pending');
    t.boolean('all_topics').notNullable().defaultTo(true);
    t.jsonb('categories').notNullable().defaultTo('[]');
    t.boolean('corrections').notNullable().defaultTo(false);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('confirmed_at', { useTz: true }).nullable();
    t.timestamp('unsubscribed_at', { useTz: true }).nullable();
    t.check("status in ('pending', 'confirmed', 'unsubscribed')", [], 'subscribers_status_check');
    t.index(['status']);
  });
  await knex.raw('create unique index subscribers_email_lower_unique on subscribers (lower(email))');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('subscribers');
}
