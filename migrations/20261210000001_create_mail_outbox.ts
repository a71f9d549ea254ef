import type { Knex } from 'knex';

// Outgoing e-mail. Every message is a row written in the same transaction as the change that
// causes it, and sent later by the worker. (recipient, purpose) is unique, so a message is
// recorded at most once per recipient and purpose (a subscriber and a report version, say).
// Tokens mailed to readers and staff are stored only as SHA-256 hashes.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('mail_outbox', (t) => {
    t.text('id').primary();
    t.text('recipient').notNullable();
    t.text('purpose').notNullable();
    t.text('kind').notNullable();
    t.jsonb('payload').notNullable().defaultTo('{}');
    t.text('state').notNullable().defaultTo('queued');
    t.integer('attempts').notNullable().defaultTo(0);
    t.text('claim').nullable();
    t.timestamp('claimed_at', { useTz: true }).nullable();
    t.timestamp('next_attempt_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.text('subject').nullable();
    t.text('message_id').notNullable();
    t.text('last_error').nullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('sent_at', { useTz: true }).nullable();
    t.timestamp('failed_at', { useTz: true }).nullable();
    t.unique(['recipient', 'purpose']);
    t.check("state in ('queued', 'sending', 'sent', 'failed', 'cancelled')", [], 'mail_outbox_state_check');
    t.index(['state', 'next_attempt_at']);
    t.index(['created_at']);
  });

  await knex.schema.createTable('email_tokens', (t) => {
    t.text('id').primary();
    t.text('purpose').notNullable();
    // What the token acts on: a subscriber, an address, a vote, an invitation or a user.
    t.text('subject').notNullable();
    t.text('token_hash').notNullable().unique();
    t.jsonb('data').nullable();
    t.text('outbox_id').nullable().references('id').inTable('mail_outbox').onDelete('SET NULL');
    t.timestamp('expires_at', { useTz: true }).nullable();
    t.timestamp('used_at', { useTz: true }).nullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check(
      "purpose in ('subscription_confirm', 'reader_manage', 'vote_confirm', 'invitation', 'password_reset')",
      [],
      'email_tokens_purpose_check',
    );
    t.index(['purpose', 'subject']);
  });

  // Counters for readers' forms (subscribe, vote, request, password reset), per client IP and per
  // address, in rate-limiter-flexible's PostgreSQL layout so every web process shares them.
  await knex.schema.createTable('reader_limits', (t) => {
    t.string('key', 255).primary();
    t.integer('points').notNullable().defaultTo(0);
    t.bigInteger('expire').nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('reader_limits');
  await knex.schema.dropTable('email_tokens');
  await knex.schema.dropTable('mail_outbox');
}
