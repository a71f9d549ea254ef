import type { DeviceUnit } from '#shared/schemas/device-units.ts';
import type { Instrument } from '#shared/schemas/instruments.ts';
import type { Maker } from '#shared/schemas/makers.ts';
import type { Model } from '#shared/schemas/models.ts';

/** Fictional catalogue rows for the client tests, as the API answers them. */
const stamp = '2025-02-03T10:00:00.000Z';

export function aMaker(id: string, name: string, extra: Partial<Maker> = {}): Maker {
  return { id, name, website: null, notes: '', modelCount: 0, createdAt: stamp, updatedAt: stamp, ...extra };
}

export function aModel(id: string, name: string, extra: Partial<Model> = {}): Model {
  return {
    id,
    makerId: 'mk-1',
    makerName: 'Aurelux',
    name,
    category: 'panel',
    emittingAreaCm: { width: 30, height: 60 },
    ledCount: 240,
    nominalWavelengths: [
      { nm: 660, sharePct: 50 },
      { nm: 850, sharePct: 50 },
    ],
    claims: { irradianceMwCm2: 100, atDistanceCm: 15, beamAngleDeg: 60, beamAngleKind: 'full' },
    price: { amountMinor: 49900, currency: 'EUR' },
    powerW: 300,
    links: [],
    notes: '',
    unitCount: 1,
    createdAt: stamp,
    updatedAt: stamp,
    ...extra,
  };
}

export function aDeviceUnit(id: string, serial: string, extra: Partial<DeviceUnit> = {}): DeviceUnit {
  return {
    id,
    modelId: 'md-1',
    modelName: 'Halo 600',
    makerName: 'Aurelux',
    serial,
    obtained: 'bought_retail',
    receivedOn: '2025-01-20',
    firmware: null,
    conditionNotes: '',
    emittingAreaCm: { width: 30, height: 60 },
    createdAt: stamp,
    updatedAt: stamp,
    ...extra,
  };
}

export function anInstrument(id: string, name: string, extra: Partial<Instrument> = {}): Instrument {
  return {
    id,
    kind: 'spectroradiometer',
    name,
    serial: `SN-${id}`,
    wavelengthRangeNm: { from: 350, to: 1100 },
    cosineCorrector: 'PTFE diffuser',
    calibratedOn: '2024-06-01',
    calibrationDueOn: '2025-06-01',
    calibrationUncertaintyPct: 4.5,
    calibrationOverdue: false,
    notes: '',
    createdAt: stamp,
    updatedAt: stamp,
    ...extra,
  };
}

export function page<T>(items: T[], extra: { total?: number; page?: number; pageSize?: number } = {}) {
  return { body: { items, total: extra.total ?? items.length, page: extra.page ?? 1, pageSize: extra.pageSize ?? 25 } };
}
