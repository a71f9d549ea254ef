import { useCallback, useState } from 'react';
import type { Maker } from '#shared/schemas/makers.ts';
import { Button } from '#src/components/button.tsx';
import { FormPanel } from '#src/components/form-panel.tsx';
import { LiveMessage, type LiveMessageValue } from '#src/components/live-message.tsx';
import { useEditor } from '#src/hooks/use-editor.ts';
import { MakerForm } from './maker-form.tsx';
import { MakersTable } from './makers-table.tsx';

/** The makers part of the catalogue: the table, and the form to add or edit a maker. */
export function MakersSection() {
  const editor = useEditor<Maker>();
  const [message, setMessage] = useState<LiveMessageValue | null>(null);
  const { state, openEdit } = editor;
  const editing = state.mode === 'edit' ? state.item : undefined;
  const onEdit = useCallback(
    (maker: Maker) => {
      setMessage(null);
      openEdit(maker);
    },
    [openEdit],
  );

  const onSaved = (maker: Maker) => {
    setMessage({ tone: 'success', text: editing ? `Maker “${maker.name}” saved.` : `Maker “${maker.name}” added to the catalogue.` });
    editor.close();
  };

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center justify-between gap-4">
        <h2 className="text-xl font-semibold">Makers</h2>
        <Button
          aria-expanded={state.mode === 'create'}
          onClick={() => {
            setMessage(null);
            editor.openCreate();
          }}
        >
          Add maker
        </Button>
      </div>
      <LiveMessage message={message} />
      {state.mode !== 'closed' ? (
        <FormPanel key={editing?.id ?? 'new'} title={editing ? `Edit maker ${editing.name}` : 'Add a maker'}>
          {(headingId) => <MakerForm maker={editing} labelledBy={headingId} onSaved={onSaved} onCancel={editor.close} />}
        </FormPanel>
      ) : null}
      <MakersTable onEdit={onEdit} />
    </div>
  );
}
