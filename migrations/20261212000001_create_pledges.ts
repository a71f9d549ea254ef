import type { Knex } from 'knex';

// Readers' funding of test requests. A request gets a goal from an editor (the unit's retail
// price plus one bench day, in one currency); readers pledge toward it through the provider's
// hosted checkout. A pledge's state follows shared/funding/pledge-workflow.ts and is moved only
// by the provider's webhooks and the refund jobs. Amounts are integer minor units; the amount
// raised is never stored: the request_funding view derives it from paid pledges.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('test_requests', (t) => {
    t.integer('goal_unit_price_minor').nullable();
    t.integer('goal_bench_day_minor').nullable();
    t.text('goal_currency').nullable();
    t.text('goal_set_by').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.timestamp('goal_set_at', { useTz: true }).nullable();
    // Set once, in the transaction of the payment that reached the goal; cleared when the
    // request's pledges are refunded (declined, or not tested within 180 days of it).
    t.timestamp('goal_reached_at', { useTz: true }).nullable();
    t.check(
      '(goal_unit_price_minor is null and goal_bench_day_minor is null and goal_currency is null) or (goal_unit_price_minor > 0 and goal_bench_day_minor >= 0 and goal_currency ~ \'^[A-Z]{3}$\')',
      [],
      'test_requests_goal_check',
    );
    t.check('goal_reached_at is null or goal_unit_price_minor is not null', [], 'test_requests_goal_reached_check');
  });

  await knex.schema.createTable('pledges', (t) => {
    t.text('id').primary();
    t.text('request_id').notNullable().references('id').inTable('test_requests').onDelete('RESTRICT');
    t.text('email').notNullable();
    // Shown on the request page; null: anonymous (counted, never named).
    t.text('public_name').nullable();
    t.boolean('notify').notNullable().defaultTo(true);
    t.integer('amount_minor').notNullable();
    t.text('currency').notNullable();
    t.text('status').notNullable().defaultTo('pending');
    t.text('checkout_session_id').nullable().unique();
    t.timestamp('checkout_expires_at', { useTz: true }).nullable();
    t.text('payment_intent_id').nullable().unique();
    t.timestamp('paid_at', { useTz: true }).nullable();
    // From the provider's balance transaction (the settle job): the charge, its fee and its time.
    t.text('charge_id').nullable().unique();
    t.integer('fee_minor').nullable();
    t.timestamp('charged_at', { useTz: true }).nullable();
    t.text('refund_id').nullable().unique();
    t.integer('refund_amount_minor').nullable();
    t.timestamp('refunded_at', { useTz: true }).nullable();
    t.text('refund_reason').nullable();
    t.text('failure_reason').nullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check('amount_minor > 0', [], 'pledges_amount_check');
    t.check("currency ~ '^[A-Z]{3}$'", [], 'pledges_currency_check');
    t.check("status in ('pending', 'paid', 'refund_pending', 'refunded', 'failed', 'expired')", [], 'pledges_status_check');
    t.check("status not in ('paid', 'refund_pending', 'refunded') or payment_intent_id is not null", [], 'pledges_paid_intent_check');
    t.check('fee_minor is null or fee_minor >= 0', [], 'pledges_fee_check');
    t.check('refund_amount_minor is null or refund_amount_minor > 0', [], 'pledges_refund_amount_check');
    t.index(['request_id', 'status']);
    t.index(['status']);
  });
  await knex.raw('create index pledges_email_lower on pledges (lower(email))');

  // What each request has raised, derived from its paid pledges whenever it is read.
  await knex.raw(`
    create view request_funding as
    select t.id as request_id,
           coalesce(sum(p.amount_minor) filter (where p.status = 'paid'), 0)::bigint as raised_minor,
           count(distinct lower(p.email)) filter (where p.status = 'paid') as backers,
           count(*) filter (where p.status = 'refund_pending') as refunds_under_way,
           count(*) filter (where p.status = 'pending') as pending_pledges
      from test_requests t
      left join pledges p on p.request_id = t.id
     group by t.id`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop view request_funding');
  await knex.schema.dropTable('pledges');
  await knex.schema.alterTable('test_requests', (t) => {
    t.dropChecks(['test_requests_goal_check', 'test_requests_goal_reached_check']);
    t.dropColumn('goal_reached_at');
    t.dropColumn('goal_set_at');
    t.dropColumn('goal_set_by');
    t.dropColumn('goal_currency');
    t.dropColumn('goal_bench_day_minor');
    t.dropColumn('goal_unit_price_minor');
  });
}
