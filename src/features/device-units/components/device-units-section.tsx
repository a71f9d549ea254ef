import { useCallback, useState } from 'react';
import type { DeviceUnit } from '#shared/schemas/device-units.ts';
import { Button } from '#src/components/button.tsx';
import { FormPanel } from '#src/components/form-panel.tsx';
import { LiveMessage, type LiveMessageValue } from '#src/components/live-message.tsx';
import { useEditor } from '#src/hooks/use-editor.ts';
import { DeviceUnitForm } from './device-unit-form.tsx';
import { DeviceUnitsTable } from './device-units-table.tsx';

/** The units part of the catalogue: the table, and the form to add or edit a unit. */
export function DeviceUnitsSection() {
  const editor = useEditor<DeviceUnit>();
  const [message, setMessage] = useState<LiveMessageValue | null>(null);
  const { state, openEdit } = editor;
  const editing = state.mode === 'edit' ? state.item : undefined;
  const onEdit = useCallback(
    (unit: DeviceUnit) => {
      setMessage(null);
      openEdit(unit);
    },
    [openEdit],
  );

  const onSaved = (unit: DeviceUnit) => {
    const name = `${unit.makerName} ${unit.modelName}, serial ${unit.serial}`;
    setMessage({ tone: 'success', text: editing ? `Unit ${name} saved.` : `Unit ${name} added to the catalogue.` });
    editor.close();
  };

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center justify-between gap-4">
        <h2 className="text-xl font-semibold">Units</h2>
        <Button
          aria-expanded={state.mode === 'create'}
          onClick={() => {
            setMessage(null);
            editor.openCreate();
          }}
        >
          Add unit
        </Button>
      </div>
      <LiveMessage message={message} />
      {state.mode !== 'closed' ? (
        <FormPanel key={editing?.id ?? 'new'} title={editing ? `Edit unit ${editing.serial}` : 'Add a unit'}>
          {(headingId) => <DeviceUnitForm unit={editing} labelledBy={headingId} onSaved={onSaved} onCancel={editor.close} />}
        </FormPanel>
      ) : null}
      <DeviceUnitsTable onEdit={onEdit} />
    </div>
  );
}
