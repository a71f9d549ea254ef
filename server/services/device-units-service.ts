import { randomUUID } from 'node:crypto';
import type { DeviceUnit, DeviceUnitBody, DeviceUnitListQuery, DeviceUnitPatch } from '#shared/schemas/device-units.ts';
import { AppError, notFound } from '../core/app-error.ts';
import type { Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import { deviceUnitsRepo } from '../db/repos/device-units-repo.ts';
import { modelsRepo } from '../db/repos/models-repo.ts';
import { audit } from './audit.ts';
import { duplicate } from './catalog-errors.ts';
import { assertCan } from './permissions.ts';

/** The physical units the lab holds (a "unit" on the pages and in the API). */
export function createDeviceUnitsService(deps: Pick<ServiceDeps, 'db' | 'clock'>) {
  const summary = (u: DeviceUnit) => ({ serial: u.serial, obtained: u.obtained, receivedOn: u.receivedOn, firmware: u.firmware });
  return {
    async list(caller: Caller, q: DeviceUnitListQuery) {
      assertCan(caller, 'lab.enter');
      return deviceUnitsRepo.list(deps.db, q);
    },

    async get(caller: Caller, id: string): Promise<DeviceUnit> {
      assertCan(caller, 'lab.enter');
      const u = await deviceUnitsRepo.findById(deps.db, id);
      if (!u) throw notFound('That unit');
      return u;
    },

    async create(caller: Caller, body: DeviceUnitBody): Promise<DeviceUnit> {
      assertCan(caller, 'catalog.manage');
      return deps.db.transaction(async (trx) => {
        if (!(await modelsRepo.findById(trx, body.modelId))) {
          throw new AppError('validation_failed', 'Some fields are not valid.', [{ path: 'body.modelId', message: 'No such model.' }]);
        }
        if (await deviceUnitsRepo.serialTaken(trx, body.modelId, body.serial)) {
          throw duplicate('body.serial', 'A unit of this model with this serial number is already in the catalogue.');
        }
        const id = randomUUID();
        await deviceUnitsRepo.insert(trx, id, body.modelId, body, deps.clock.now());
        const unit = (await deviceUnitsRepo.findById(trx, id))!;
        await audit({ trx, clock: deps.clock, caller, action: 'unit.create', entity: { type: 'unit', id }, after: summary(unit) });
        return unit;
      });
    },

    async update(caller: Caller, id: string, patch: DeviceUnitPatch): Promise<DeviceUnit> {
      assertCan(caller, 'catalog.manage');
      return deps.db.transaction(async (trx) => {
        const before = await deviceUnitsRepo.findById(trx, id);
        if (!before) throw notFound('That unit');
        if (patch.serial && (await deviceUnitsRepo.serialTaken(trx, before.modelId, patch.serial, id))) {
          throw duplicate('body.serial', 'A unit of this model with this serial number is already in the catalogue.');
        }
        await deviceUnitsRepo.update(trx, id, patch, deps.clock.now());
        const after = (await deviceUnitsRepo.findById(trx, id))!;
        await audit({ trx, clock: deps.clock, caller, action: 'unit.update', entity: { type: 'unit', id }, before: summary(before), after: summary(after) });
        return after;
      });
    },
  };
}
