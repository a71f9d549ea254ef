import type { Knex } from 'knex';

// Readers' requests to test a device, and their votes. A request is listed once its first vote
// (the requester's) is confirmed by e-mail; a vote counts once confirmed, one per address and
// request. Editors triage: planned, declined with a reason, tested with a report, or merged into
// a near-duplicate (whose votes then add up).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('test_requests', (t) => {
    t.text('id').primary();
    t.text('maker').notNullable();
    t.text('model').notNullable();
    t.text('link').notNullable();
    t.text('reason').notNullable();
    t.text('status').notNullable().defaultTo('unconfirmed');
    t.text('decline_reason').nullable();
    t.text('report_id').nullable().references('id').inTable('reports').onDelete('SET NULL');
    t.text('merged_into').nullable().references('id').inTable('test_requests').onDelete('SET NULL');
    t.text('triaged_by').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.timestamp('triaged_at', { useTz: true }).nullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("status in ('unconfirmed', 'open', 'planned', 'declined', 'tested', 'merged')", [], 'test_requests_status_check');
    t.check("status <> 'declined' or decline_reason is not null", [], 'test_requests_decline_reason_check');
    t.check("status <> 'merged' or merged_into is not null", [], 'test_requests_merged_check');
    t.index(['status']);
    t.index(['report_id']);
  });

  await knex.schema.createTable('test_request_votes', (t) => {
    t.text('id').primary();
    t.text('request_id').notNullable().references('id').inTable('test_requests').onDelete('CASCADE');
    t.text('email').notNullable();
    t.text('status').notNullable().defaultTo('pending');
    t.boolean('notify').notNullable().defaultTo(false);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('confirmed_at', { useTz: true }).nullable();
    t.check("status in ('pending', 'confirmed')", [], 'test_request_votes_status_check');
    t.index(['request_id', 'status']);
  });
  await knex.raw('create unique index test_request_votes_request_email_unique on test_request_votes (request_id, lower(email))');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('test_request_votes');
  await knex.schema.dropTable('test_requests');
}
