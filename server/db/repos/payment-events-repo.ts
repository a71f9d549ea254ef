import type { Knex } from 'knex';

export interface PaymentEventRow {
  id: string;
  type: string;
  payload: unknown;
  receivedAt: Date;
  processedAt: Date | null;
}

const toRow = (r: { id: string; type: string; payload: unknown; received_at: Date; processed_at: Date | null }): PaymentEventRow => ({
  id: r.id,
  type: r.type,
  payload: r.payload,
  receivedAt: r.received_at,
  processedAt: r.processed_at,
});

/** The provider's webhook events, one row per event id. */
export const paymentEventsRepo = {
  /** Inserts unless an event with this id is stored already; true when this call stored it. */
  async insertIfNew(db: Knex, e: { id: string; type: string; payload: unknown; receivedAt: Date }): Promise<boolean> {
    const inserted = await db('payment_events')
      .insert({ id: e.id, type: e.type, payload: JSON.stringify(e.payload), received_at: e.receivedAt })
      .onConflict('id')
      .ignore()
      .returning('id');
    return inserted.length === 1;
  },

  async markProcessed(db: Knex, id: string, at: Date): Promise<void> {
    await db('payment_events').where({ id }).update({ processed_at: at });
  },

  async findById(db: Knex, id: string): Promise<PaymentEventRow | null> {
    const r = await db('payment_events').where({ id }).first();
    return r ? toRow(r) : null;
  },

  async listByType(db: Knex, type: string): Promise<PaymentEventRow[]> {
    const rows = await db('payment_events').where({ type }).orderBy('received_at');
    return rows.map(toRow);
  },

  async count(db: Knex): Promise<number> {
    const [{ n }] = await db('payment_events').count<{ n: number }[]>({ n: '*' });
    return Number(n);
  },
};
