import { randomUUID } from 'node:crypto';
import type { Maker, MakerBody, MakerListQuery, MakerPatch } from '#shared/schemas/makers.ts';
import { notFound } from '../core/app-error.ts';
import type { Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import { makersRepo } from '../db/repos/makers-repo.ts';
import { audit } from './audit.ts';
import { duplicate } from './catalog-errors.ts';
import { assertCan } from './permissions.ts';

export function createMakersService(deps: Pick<ServiceDeps, 'db' | 'clock'>) {
  const summary = (m: Maker) => ({ name: m.name, website: m.website });
  return {
    async list(caller: Caller, q: MakerListQuery) {
      assertCan(caller, 'lab.enter');
      return makersRepo.list(deps.db, q);
    },

    async get(caller: Caller, id: string): Promise<Maker> {
      assertCan(caller, 'lab.enter');
      const m = await makersRepo.findById(deps.db, id);
      if (!m) throw notFound('That maker');
      return m;
    },

    async create(caller: Caller, body: MakerBody): Promise<Maker> {
      assertCan(caller, 'catalog.manage');
      return deps.db.transaction(async (trx) => {
        if (await makersRepo.nameTaken(trx, body.name)) throw duplicate('body.name', 'A maker of this name is already in the catalogue.');
        const id = randomUUID();
        await makersRepo.insert(trx, { id, name: body.name, website: body.website ?? null, notes: body.notes ?? '', now: deps.clock.now() });
        const maker = (await makersRepo.findById(trx, id))!;
        await audit({ trx, clock: deps.clock, caller, action: 'maker.create', entity: { type: 'maker', id }, after: summary(maker) });
        return maker;
      });
    },

    async update(caller: Caller, id: string, patch: MakerPatch): Promise<Maker> {
      assertCan(caller, 'catalog.manage');
      return deps.db.transaction(async (trx) => {
        const before = await makersRepo.findById(trx, id);
        if (!before) throw notFound('That maker');
        if (patch.name && (await makersRepo.nameTaken(trx, patch.name, id))) throw duplicate('body.name', 'A maker of this name is already in the catalogue.');
        await makersRepo.update(trx, id, { name: patch.name, website: patch.website, notes: patch.notes }, deps.clock.now());
        const after = (await makersRepo.findById(trx, id))!;
        await audit({ trx, clock: deps.clock, caller, action: 'maker.update', entity: { type: 'maker', id }, before: summary(before), after: summary(after) });
        return after;
      });
    },
  };
}
