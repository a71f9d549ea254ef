import type { Knex } from 'knex';

// Staff accounts. The id is text because the session library wants TEXT primary keys.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.text('id').primary();
    t.text('email').notNullable();
    t.text('display_name').notNullable();
    t.text('role').notNullable();
    t.boolean('active').notNullable().defaultTo(true);
    t.text('password_hash').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.check("role in ('tester', 'editor', 'admin')", [], 'users_role_check');
  });
  // E-mail is unique whatever its case.
  await knex.raw('create unique index users_email_lower_unique on users (lower(email))');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('users');
}
