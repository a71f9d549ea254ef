import { useCallback, useState } from 'react';
import type { Instrument } from '#shared/schemas/instruments.ts';
import { Button } from '#src/components/button.tsx';
import { FormPanel } from '#src/components/form-panel.tsx';
import { LiveMessage, type LiveMessageValue } from '#src/components/live-message.tsx';
import { useEditor } from '#src/hooks/use-editor.ts';
import { InstrumentForm } from './instrument-form.tsx';
import { InstrumentsTable } from './instruments-table.tsx';

/** The instruments part of the catalogue: the table, and the form to add or edit an instrument. */
export function InstrumentsSection() {
  const editor = useEditor<Instrument>();
  const [message, setMessage] = useState<LiveMessageValue | null>(null);
  const { state, openEdit } = editor;
  const editing = state.mode === 'edit' ? state.item : undefined;
  const onEdit = useCallback(
    (instrument: Instrument) => {
      setMessage(null);
      openEdit(instrument);
    },
    [openEdit],
  );

  const onSaved = (instrument: Instrument) => {
    const overdue = instrument.calibrationOverdue ? ' Its calibration is overdue.' : '';
    setMessage({
      tone: 'success',
      text: `${editing ? `Instrument “${instrument.name}” saved.` : `Instrument “${instrument.name}” added to the catalogue.`}${overdue}`,
    });
    editor.close();
  };

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center justify-between gap-4">
        <h2 className="text-xl font-semibold">Instruments</h2>
        <Button
          aria-expanded={state.mode === 'create'}
          onClick={() => {
            setMessage(null);
            editor.openCreate();
          }}
        >
          Add instrument
        </Button>
      </div>
      <LiveMessage message={message} />
      {state.mode !== 'closed' ? (
        <FormPanel key={editing?.id ?? 'new'} title={editing ? `Edit instrument ${editing.name}` : 'Add an instrument'}>
          {(headingId) => <InstrumentForm instrument={editing} labelledBy={headingId} onSaved={onSaved} onCancel={editor.close} />}
        </FormPanel>
      ) : null}
      <InstrumentsTable onEdit={onEdit} />
    </div>
  );
}
