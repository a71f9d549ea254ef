import type { Knex } from 'knex';

// Staff invitations: an admin names the address and the role; the invitee sets their own
// password from the e-mailed link. At most one pending invitation per address.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('staff_invitations', (t) => {
    t.text('id').primary();
    t.text('email').notNullable();
    t.text('display_name').notNullable();
    t.text('role').notNullable();
    t.text('status').notNullable().defaultTo('pending');
    t.text('invited_by').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.text('user_id').nullable().references('id').inTable('users').onDelete('SET NULL');
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('accepted_at', { useTz: true }).nullable();
    t.timestamp('revoked_at', { useTz: true }).nullable();
    t.check("role in ('tester', 'editor', 'admin')", [], 'staff_invitations_role_check');
    t.check("status in ('pending', 'accepted', 'revoked')", [], 'staff_invitations_status_check');
  });
  await knex.raw("create unique index staff_invitations_pending_email_unique on staff_invitations (lower(email)) where status = 'pending'");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('staff_invitations');
}
