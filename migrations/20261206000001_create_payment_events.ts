import type { Knex } from 'knex';

// Every webhook event the payment provider sent, once: its own event id is the key, so a resent
// event is recognised and changes nothing. The payload is kept whole, as received and verified.
// processed_at is set when a handler for the event's type ran in the same transaction.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('payment_events', (t) => {
    t.text('id').primary();
    t.text('type').notNullable();
    t.jsonb('payload').notNullable();
    t.timestamp('received_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('processed_at', { useTz: true }).nullable();
    t.index(['type', 'received_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('payment_events');
}
