import { randomUUID } from 'node:crypto';
import type { Model, ModelBody, ModelListQuery, ModelPatch } from '#shared/schemas/models.ts';
import { AppError, notFound } from '../core/app-error.ts';
import type { Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import { makersRepo } from '../db/repos/makers-repo.ts';
import { modelsRepo } from '../db/repos/models-repo.ts';
import { audit } from './audit.ts';
import { duplicate } from './catalog-errors.ts';
import { assertCan } from './permissions.ts';

export function createModelsService(deps: Pick<ServiceDeps, 'db' | 'clock'>) {
  const summary = (m: Model) => ({ name: m.name, category: m.category, emittingAreaCm: m.emittingAreaCm, claims: m.claims, price: m.price });
  return {
    async list(caller: Caller, q: ModelListQuery) {
      assertCan(caller, 'lab.enter');
      return modelsRepo.list(deps.db, q);
    },

    async get(caller: Caller, id: string): Promise<Model> {
      assertCan(caller, 'lab.enter');
      const m = await modelsRepo.findById(deps.db, id);
      if (!m) throw notFound('That model');
      return m;
    },

    async create(caller: Caller, body: ModelBody): Promise<Model> {
      assertCan(caller, 'catalog.manage');
      return deps.db.transaction(async (trx) => {
        if (!(await makersRepo.findById(trx, body.makerId))) {
          throw new AppError('validation_failed', 'Some fields are not valid.', [{ path: 'body.makerId', message: 'No such maker.' }]);
        }
        if (await modelsRepo.nameTaken(trx, body.makerId, body.name)) throw duplicate('body.name', 'This maker already has a model of this name.');
        const id = randomUUID();
        await modelsRepo.insert(trx, id, body.makerId, body, deps.clock.now());
        const model = (await modelsRepo.findById(trx, id))!;
        await audit({ trx, clock: deps.clock, caller, action: 'model.create', entity: { type: 'model', id }, after: summary(model) });
        return model;
      });
    },

    async update(caller: Caller, id: string, patch: ModelPatch): Promise<Model> {
      assertCan(caller, 'catalog.manage');
      return deps.db.transaction(async (trx) => {
        const before = await modelsRepo.findById(trx, id);
        if (!before) throw notFound('That model');
        if (patch.name && (await modelsRepo.nameTaken(trx, before.makerId, patch.name, id))) {
          throw duplicate('body.name', 'This maker already has a model of this name.');
        }
        await modelsRepo.update(trx, id, patch, deps.clock.now());
        const after = (await modelsRepo.findById(trx, id))!;
        await audit({ trx, clock: deps.clock, caller, action: 'model.update', entity: { type: 'model', id }, before: summary(before), after: summary(after) });
        return after;
      });
    },
  };
}
