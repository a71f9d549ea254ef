import type { Knex } from 'knex';

// Reports: the published account of one or more approved runs of a model. Each publication is a
// version with its write-up and its figures frozen; a correction adds a version, a retraction
// keeps the page with a reason.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('reports', (t) => {
    t.text('id').primary();
    t.text('slug').notNullable().unique();
    t.text('model_id').notNullable().references('id').inTable('models').onDelete('RESTRICT');
    t.text('status').notNullable().defaultTo('draft');
    t.integer('current_version').notNullable().defaultTo(0);
    t.text('draft_title').notNullable();
    t.text('draft_summary').notNullable();
    t.text('draft_body_markdown').notNullable();
    t.text('created_by').notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('retracted_at', { useTz: true }).nullable();
    t.text('retraction_reason').nullable();
    t.check("status in ('draft', 'published', 'retracted')", [], 'reports_status_check');
    t.index(['status']);
  });

  await knex.schema.createTable('report_runs', (t) => {
    t.text('report_id').notNullable().references('id').inTable('reports').onDelete('CASCADE');
    t.text('run_id').notNullable().references('id').inTable('runs').onDelete('RESTRICT');
    t.integer('position').notNullable();
    t.primary(['report_id', 'run_id']);
  });

  await knex.schema.createTable('report_versions', (t) => {
    t.text('report_id').notNullable().references('id').inTable('reports').onDelete('CASCADE');
    t.integer('version').notNullable();
    t.text('title').notNullable();
    t.text('summary').notNullable();
    t.text('body_markdown').notNullable();
    t.text('body_html').notNullable();
    t.jsonb('snapshot').notNullable();
    t.text('change_note').nullable();
    t.text('published_by').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.timestamp('published_at', { useTz: true }).notNullable();
    t.primary(['report_id', 'version']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('report_versions');
  await knex.schema.dropTable('report_runs');
  await knex.schema.dropTable('reports');
}
