import type { Knex } from 'knex';

// The lab's catalogue: makers, their models (with the maker's claims), the physical units the
// lab holds, and its instruments with their calibration records.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('makers', (t) => {
    t.text('id').primary();
    t.text('name').notNullable();
    t.text('website').nullable();
    t.text('notes').notNullable().defaultTo('');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw('create unique index makers_name_lower_unique on makers (lower(name))');

  await knex.schema.createTable('models', (t) => {
    t.text('id').primary();
    t.text('maker_id').notNullable().references('id').inTable('makers').onDelete('RESTRICT');
    t.text('name').notNullable();
    t.text('category').notNullable();
    t.decimal('emitting_width_cm', 10, 3).notNullable();
    t.decimal('emitting_height_cm', 10, 3).notNullable();
    t.integer('led_count').nullable();
    t.jsonb('nominal_wavelengths').notNullable().defaultTo('[]');
    t.decimal('claimed_irradiance_mw_cm2', 12, 4).nullable();
    t.decimal('claimed_at_distance_cm', 10, 3).nullable();
    t.decimal('claimed_beam_angle_deg', 8, 3).nullable();
    t.text('claimed_beam_angle_kind').nullable();
    t.bigInteger('price_minor').nullable();
    t.text('price_currency').nullable();
    t.decimal('power_w', 12, 3).nullable();
    t.jsonb('links').notNullable().defaultTo('[]');
    t.text('notes').notNullable().defaultTo('');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("category in ('panel', 'mat', 'pad', 'cap', 'other')", [], 'models_category_check');
    t.check("claimed_beam_angle_kind is null or claimed_beam_angle_kind in ('full', 'half')", [], 'models_beam_angle_kind_check');
    t.check('(price_minor is null) = (price_currency is null)', [], 'models_price_check');
    t.index(['maker_id']);
  });
  await knex.raw('create unique index models_maker_name_unique on models (maker_id, lower(name))');

  await knex.schema.createTable('device_units', (t) => {
    t.text('id').primary();
    t.text('model_id').notNullable().references('id').inTable('models').onDelete('RESTRICT');
    t.text('serial').notNullable();
    t.text('obtained').notNullable();
    t.date('received_on').nullable();
    t.text('firmware').nullable();
    t.text('condition_notes').notNullable().defaultTo('');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("obtained in ('bought_retail', 'loaned', 'donated')", [], 'device_units_obtained_check');
    t.index(['model_id']);
  });
  await knex.raw('create unique index device_units_model_serial_unique on device_units (model_id, lower(serial))');

  await knex.schema.createTable('instruments', (t) => {
    t.text('id').primary();
    t.text('kind').notNullable();
    t.text('name').notNullable();
    t.text('serial').notNullable();
    t.decimal('range_from_nm', 10, 3).nullable();
    t.decimal('range_to_nm', 10, 3).nullable();
    t.text('cosine_corrector').nullable();
    t.date('calibrated_on').notNullable();
    t.date('calibration_due_on').notNullable();
    t.decimal('calibration_uncertainty_pct', 8, 4).notNullable();
    t.text('notes').notNullable().defaultTo('');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("kind in ('spectroradiometer', 'irradiance_meter')", [], 'instruments_kind_check');
  });
  await knex.raw('create unique index instruments_kind_serial_unique on instruments (kind, lower(serial))');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('instruments');
  await knex.schema.dropTable('device_units');
  await knex.schema.dropTable('models');
  await knex.schema.dropTable('makers');
}
