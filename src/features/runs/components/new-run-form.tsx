import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { runBodySchema, type RunBody } from '#shared/schemas/runs.ts';
import { Alert } from '#src/components/alert.tsx';
import { Button } from '#src/components/button.tsx';
import { SelectField } from '#src/components/select-field.tsx';
import { TextField } from '#src/components/text-field.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { formatDate } from '#src/lib/format.ts';
import { useCreateRun } from '../api/create-run.ts';
import { useRunFormOptions } from '../api/run-form-options.ts';
import { GridEditor, gridOf, type GridChoice } from './grid-editor.tsx';

type Field = 'unitId' | 'instrumentId' | 'distancesCm' | 'xCm' | 'yCm' | 'measuredOn' | 'roomTempC' | 'warmupMinutes' | 'mainsVoltageV' | 'notes' | 'form';

const number = (text: string): number | null | undefined => {
  if (text.trim() === '') return null;
  const v = Number(text.replace(',', '.'));
  return Number.isFinite(v) ? v : undefined;
};

/** A new run: one unit, one instrument, one grid, the conditions. The shared schema checks it here and on the server. */
export function NewRunForm({ today }: { today: string }) {
  const navigate = useNavigate();
  const create = useCreateRun();
  const { units, instruments } = useRunFormOptions();
  const [unitId, setUnitId] = useState('');
  const [instrumentId, setInstrumentId] = useState('');
  const [choice, setChoice] = useState<GridChoice>({ preset: 'standard', custom: { distancesCm: '', xCm: '', yCm: '' } });
  const [centerChecks, setCenterChecks] = useState(false);
  const [measuredOn, setMeasuredOn] = useState(today);
  const [conditions, setConditions] = useState({ roomTempC: '', warmupMinutes: '', mainsVoltageV: '' });
  const [notes, setNotes] = useState('');
  const [errors, setErrors] = useState<Partial<Record<Field, string>>>({});

  const unit = units.data?.items.find((u) => u.id === unitId) ?? null;
  const instrument = instruments.data?.items.find((i) => i.id === instrumentId) ?? null;
  const emitting = unit ? { widthCm: unit.emittingAreaCm.width, heightCm: unit.emittingAreaCm.height } : null;

  const submit = () => {
    const grid = gridOf(choice, emitting);
    const cond = { roomTempC: number(conditions.roomTempC), warmupMinutes: number(conditions.warmupMinutes), mainsVoltageV: number(conditions.mainsVoltageV) };
    const problems: Partial<Record<Field, string>> = {};
    for (const [k, v] of Object.entries(cond)) if (v === undefined) problems[k as Field] = 'Enter a number, or leave it empty.';
    const body: RunBody = {
      unitId,
      instrumentId,
      grid: grid ?? { distancesCm: [], xCm: [], yCm: [] },
      centerChecks,
      measuredOn,
      conditions: { roomTempC: cond.roomTempC ?? null, warmupMinutes: cond.warmupMinutes ?? null, mainsVoltageV: cond.mainsVoltageV ?? null },
      notes,
    };
    const parsed = runBodySchema.safeParse(body);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const key = (issue.path[0] === 'grid' ? issue.path[1] : issue.path[issue.path.length - 1]) as Field;
        problems[key] ??= issue.message;
      }
    }
    setErrors(problems);
    if (Object.keys(problems).length > 0) return;
    create.mutate(body, {
      onSuccess: (run) => void navigate(`/lab/runs/${run.id}`),
      onError: (err) => {
        if (isApiError(err) && err.code === 'validation_failed') {
          const next: Partial<Record<Field, string>> = {};
          for (const i of err.fieldIssues) next[i.path as Field] = i.message;
          setErrors(Object.keys(next).length ? next : { form: err.message });
        } else setErrors({ form: isApiError(err) ? err.message : 'The run was not created.' });
      },
    });
  };

  return (
    <form
      noValidate
      className="max-w-3xl space-y-6"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      {errors.form ? <Alert tone="error">{errors.form}</Alert> : null}
      <SelectField
        label="Unit"
        value={unitId}
        error={errors.unitId}
        onChange={(e) => setUnitId(e.target.value)}
        options={[{ value: '', label: units.isPending ? 'Loading…' : 'Choose a unit' }, ...(units.data?.items ?? []).map((u) => ({ value: u.id, label: `${u.makerName} ${u.modelName} — ${u.serial}` }))]}
      />
      <SelectField
        label="Instrument"
        value={instrumentId}
        error={errors.instrumentId}
        hint={
          instrument?.calibrationOverdue ? (
            <span className="font-semibold text-danger">
              Warning: this instrument's calibration was due on {formatDate(instrument.calibrationDueOn)}. The run will carry a flag.
            </span>
          ) : undefined
        }
        onChange={(e) => setInstrumentId(e.target.value)}
        options={[
          { value: '', label: instruments.isPending ? 'Loading…' : 'Choose an instrument' },
          ...(instruments.data?.items ?? []).map((i) => ({
            value: i.id,
            label: `${i.name} — ${i.serial}${i.calibrationOverdue ? ' (calibration overdue)' : ''}`,
          })),
        ]}
      />
      <GridEditor choice={choice} onChange={setChoice} emitting={emitting} errors={{ distancesCm: errors.distancesCm, xCm: errors.xCm, yCm: errors.yCm }} />
      <label className="flex items-start gap-2 font-sans text-sm">
        <input type="checkbox" checked={centerChecks} onChange={(e) => setCenterChecks(e.target.checked)} className="mt-1" />
        <span>
          <span className="font-semibold">Centre readings at the start and end of each plane</span>
          <span className="block text-xs text-ink-soft">For the drift check: a change above 5 % between the two is flagged.</span>
        </span>
      </label>
      <fieldset className="grid gap-4 md:grid-cols-4">
        <legend className="mb-2 font-sans text-sm font-semibold text-ink">Conditions</legend>
        <TextField label="Measured on" type="date" value={measuredOn} error={errors.measuredOn} onChange={(e) => setMeasuredOn(e.target.value)} />
        <TextField label="Room temperature (°C)" inputMode="decimal" value={conditions.roomTempC} error={errors.roomTempC} onChange={(e) => setConditions({ ...conditions, roomTempC: e.target.value })} />
        <TextField label="Warm-up (minutes)" inputMode="decimal" value={conditions.warmupMinutes} error={errors.warmupMinutes} onChange={(e) => setConditions({ ...conditions, warmupMinutes: e.target.value })} />
        <TextField label="Mains voltage (V)" inputMode="decimal" value={conditions.mainsVoltageV} error={errors.mainsVoltageV} onChange={(e) => setConditions({ ...conditions, mainsVoltageV: e.target.value })} />
      </fieldset>
      <TextField label="Notes" value={notes} error={errors.notes} onChange={(e) => setNotes(e.target.value)} />
      <Button type="submit" pending={create.isPending}>
        Create the run
      </Button>
    </form>
  );
}
