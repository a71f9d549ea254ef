import { deviceUnitBodySchema, type DeviceUnit, type DeviceUnitBody } from '#shared/schemas/device-units.ts';
import { formSchema, textOrNull } from '#src/lib/form-schema.ts';

/** The unit form as typed: a blank date or firmware is text until the form is sent. */
export interface DeviceUnitFormValues {
  modelId: string;
  serial: string;
  obtained: DeviceUnit['obtained'];
  /** YYYY-MM-DD from a date input; '' when not known. */
  receivedOn: string;
  firmware: string;
  conditionNotes: string;
}

export const emptyDeviceUnitForm: DeviceUnitFormValues = {
  modelId: '',
  serial: '',
  obtained: 'bought_retail',
  receivedOn: '',
  firmware: '',
  conditionNotes: '',
};

export function deviceUnitToFormValues(unit: DeviceUnit): DeviceUnitFormValues {
  return {
    modelId: unit.modelId,
    serial: unit.serial,
    obtained: unit.obtained,
    receivedOn: unit.receivedOn ?? '',
    firmware: unit.firmware ?? '',
    conditionNotes: unit.conditionNotes,
  };
}

/** Blanks are sent as null, so an edit can clear a date or a firmware version. */
export function toDeviceUnitBody(v: DeviceUnitFormValues): unknown {
  return {
    modelId: v.modelId,
    serial: v.serial,
    obtained: v.obtained,
    receivedOn: textOrNull(v.receivedOn),
    firmware: textOrNull(v.firmware),
    conditionNotes: v.conditionNotes,
  };
}

const FIELDS = new Set(['modelId', 'serial', 'obtained', 'receivedOn', 'firmware', 'conditionNotes']);

export function isDeviceUnitField(field: string): boolean {
  return FIELDS.has(field);
}

export const deviceUnitFormSchema = formSchema<DeviceUnitFormValues, DeviceUnitBody>(deviceUnitBodySchema, toDeviceUnitBody);
