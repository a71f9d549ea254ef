import { randomUUID } from 'node:crypto';
import type { Instrument, InstrumentBody, InstrumentListQuery, InstrumentPatch } from '#shared/schemas/instruments.ts';
import { notFound, validationFailed } from '../core/app-error.ts';
import type { Caller } from '../core/caller.ts';
import type { ServiceDeps } from '../core/context.ts';
import { today } from '../core/today.ts';
import { instrumentsRepo } from '../db/repos/instruments-repo.ts';
import { audit } from './audit.ts';
import { duplicate } from './catalog-errors.ts';
import { assertCan } from './permissions.ts';

export function createInstrumentsService(deps: Pick<ServiceDeps, 'db' | 'clock'>) {
  const summary = (i: Instrument) => ({
    name: i.name,
    serial: i.serial,
    calibratedOn: i.calibratedOn,
    calibrationDueOn: i.calibrationDueOn,
    calibrationUncertaintyPct: i.calibrationUncertaintyPct,
  });
  return {
    async list(caller: Caller, q: InstrumentListQuery) {
      assertCan(caller, 'lab.enter');
      return instrumentsRepo.list(deps.db, q, today(deps.clock));
    },

    async get(caller: Caller, id: string): Promise<Instrument> {
      assertCan(caller, 'lab.enter');
      const i = await instrumentsRepo.findById(deps.db, id, today(deps.clock));
      if (!i) throw notFound('That instrument');
      return i;
    },

    async create(caller: Caller, body: InstrumentBody): Promise<Instrument> {
      assertCan(caller, 'catalog.manage');
      return deps.db.transaction(async (trx) => {
        if (await instrumentsRepo.serialTaken(trx, body.kind, body.serial)) {
          throw duplicate('body.serial', 'An instrument of this kind with this serial number is already in the catalogue.');
        }
        const id = randomUUID();
        await instrumentsRepo.insert(trx, id, body, deps.clock.now());
        const instrument = (await instrumentsRepo.findById(trx, id, today(deps.clock)))!;
        await audit({ trx, clock: deps.clock, caller, action: 'instrument.create', entity: { type: 'instrument', id }, after: summary(instrument) });
        return instrument;
      });
    },

    async update(caller: Caller, id: string, patch: InstrumentPatch): Promise<Instrument> {
      assertCan(caller, 'catalog.manage');
      return deps.db.transaction(async (trx) => {
        const before = await instrumentsRepo.findById(trx, id, today(deps.clock));
        if (!before) throw notFound('That instrument');
        if (patch.serial && (await instrumentsRepo.serialTaken(trx, before.kind, patch.serial, id))) {
          throw duplicate('body.serial', 'An instrument of this kind with this serial number is already in the catalogue.');
        }
        const calibratedOn = patch.calibratedOn ?? before.calibratedOn;
        const dueOn = patch.calibrationDueOn ?? before.calibrationDueOn;
        if (dueOn <= calibratedOn) {
          throw validationFailed([{ path: 'body.calibrationDueOn', message: 'The due date comes after the calibration date.' }]);
        }
        await instrumentsRepo.update(trx, id, patch, deps.clock.now());
        const after = (await instrumentsRepo.findById(trx, id, today(deps.clock)))!;
        await audit({ trx, clock: deps.clock, caller, action: 'instrument.update', entity: { type: 'instrument', id }, before: summary(before), after: summary(after) });
        return after;
      });
    },
  };
}
