import type { Knex } from 'knex';

// Runs and what they hold: raw files (content-addressed, kept for provenance), each upload batch,
// the files of a run with the point they fill, one reading per grid point pointing at its current
// file, each file's analysis (once per file), the run's computed figures and the review comments.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('runs', (t) => {
    t.text('id').primary();
    t.text('unit_id').notNullable().references('id').inTable('device_units').onDelete('RESTRICT');
    t.text('instrument_id').notNullable().references('id').inTable('instruments').onDelete('RESTRICT');
    t.text('status').notNullable().defaultTo('draft');
    t.jsonb('grid').notNullable();
    t.jsonb('bands').notNullable();
    t.boolean('center_checks').notNullable().defaultTo(false);
    t.decimal('room_temp_c', 6, 2).nullable();
    t.decimal('warmup_minutes', 8, 2).nullable();
    t.decimal('mains_voltage_v', 8, 2).nullable();
    t.text('notes').notNullable().defaultTo('');
    t.text('measured_by').notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.date('measured_on').notNullable();
    t.text('created_by').notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('submitted_at', { useTz: true }).nullable();
    t.timestamp('decided_at', { useTz: true }).nullable();
    t.text('decided_by').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.check("status in ('draft', 'submitted', 'changes_requested', 'approved', 'published')", [], 'runs_status_check');
    t.index(['status']);
    t.index(['unit_id']);
  });

  // Raw bytes by SHA-256: the storage interface's PostgreSQL backend (an object store later).
  await knex.schema.createTable('stored_files', (t) => {
    t.text('key').primary();
    t.integer('size_bytes').notNullable();
    t.binary('bytes').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('run_batches', (t) => {
    t.text('id').primary();
    t.text('run_id').notNullable().references('id').inTable('runs').onDelete('CASCADE');
    t.text('uploaded_by').notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.integer('file_count').notNullable();
    t.text('manifest_name').nullable();
    t.timestamp('uploaded_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('run_files', (t) => {
    t.text('id').primary();
    t.text('run_id').notNullable().references('id').inTable('runs').onDelete('CASCADE');
    t.text('batch_id').notNullable().references('id').inTable('run_batches').onDelete('CASCADE');
    t.text('storage_key').notNullable().references('key').inTable('stored_files').onDelete('RESTRICT');
    t.text('sha256').notNullable();
    t.text('original_name').notNullable();
    t.integer('size_bytes').notNullable();
    t.text('kind').notNullable();
    t.text('slot').nullable();
    t.decimal('distance_cm', 10, 4).nullable();
    t.decimal('x_cm', 10, 4).nullable();
    t.decimal('y_cm', 10, 4).nullable();
    t.text('uploaded_by').notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('uploaded_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['run_id', 'sha256']);
    t.check("kind in ('spectrum', 'meter')", [], 'run_files_kind_check');
    t.index(['run_id']);
  });

  await knex.schema.createTable('readings', (t) => {
    t.text('id').primary();
    t.text('run_id').notNullable().references('id').inTable('runs').onDelete('CASCADE');
    t.text('slot').notNullable();
    t.decimal('distance_cm', 10, 4).notNullable();
    t.decimal('x_cm', 10, 4).notNullable();
    t.decimal('y_cm', 10, 4).notNullable();
    t.text('current_file_id').nullable().references('id').inTable('run_files').onDelete('SET NULL');
    t.text('excluded_reason').nullable();
    t.text('excluded_by').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.timestamp('excluded_at', { useTz: true }).nullable();
    t.unique(['run_id', 'slot', 'distance_cm', 'x_cm', 'y_cm']);
    t.check("slot in ('grid', 'center_start', 'center_end')", [], 'readings_slot_check');
  });

  // One analysis per file, ever: the primary key makes a retried job a no-op.
  await knex.schema.createTable('file_analyses', (t) => {
    t.text('run_file_id').primary().references('id').inTable('run_files').onDelete('CASCADE');
    t.text('run_id').notNullable().references('id').inTable('runs').onDelete('CASCADE');
    t.boolean('ok').notNullable();
    t.jsonb('issues').notNullable().defaultTo('[]');
    t.text('unit').nullable();
    t.binary('wavelengths_nm').nullable();
    t.binary('irradiance_wm2_nm').nullable();
    t.jsonb('summary').nullable();
    t.jsonb('meter_values').nullable();
    t.timestamp('analysed_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['run_id']);
  });

  await knex.schema.createTable('run_analyses', (t) => {
    t.text('run_id').primary().references('id').inTable('runs').onDelete('CASCADE');
    t.text('fingerprint').notNullable();
    t.jsonb('figures').notNullable();
    t.jsonb('flags').notNullable();
    t.jsonb('values').notNullable();
    t.timestamp('computed_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('run_comments', (t) => {
    t.text('id').primary();
    t.text('run_id').notNullable().references('id').inTable('runs').onDelete('CASCADE');
    t.text('reading_id').nullable().references('id').inTable('readings').onDelete('SET NULL');
    t.text('author_id').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.text('author_label').notNullable();
    t.text('body').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['run_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['run_comments', 'run_analyses', 'file_analyses', 'readings', 'run_files', 'run_batches', 'stored_files', 'runs']) {
    await knex.schema.dropTable(table);
  }
}
