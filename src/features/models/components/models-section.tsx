import { useCallback, useState } from 'react';
import type { Model } from '#shared/schemas/models.ts';
import { Button } from '#src/components/button.tsx';
import { FormPanel } from '#src/components/form-panel.tsx';
import { LiveMessage, type LiveMessageValue } from '#src/components/live-message.tsx';
import { useEditor } from '#src/hooks/use-editor.ts';
import { ModelForm } from './model-form.tsx';
import { ModelsTable } from './models-table.tsx';

/** The models part of the catalogue: the table, and the form to add or edit a model. */
export function ModelsSection() {
  const editor = useEditor<Model>();
  const [message, setMessage] = useState<LiveMessageValue | null>(null);
  const { state, openEdit } = editor;
  const editing = state.mode === 'edit' ? state.item : undefined;
  const onEdit = useCallback(
    (model: Model) => {
      setMessage(null);
      openEdit(model);
    },
    [openEdit],
  );

  const onSaved = (model: Model) => {
    const name = `${model.makerName} ${model.name}`;
    setMessage({ tone: 'success', text: editing ? `Model “${name}” saved.` : `Model “${name}” added to the catalogue.` });
    editor.close();
  };

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center justify-between gap-4">
        <h2 className="text-xl font-semibold">Models</h2>
        <Button
          aria-expanded={state.mode === 'create'}
          onClick={() => {
            setMessage(null);
            editor.openCreate();
          }}
        >
          Add model
        </Button>
      </div>
      <LiveMessage message={message} />
      {state.mode !== 'closed' ? (
        <FormPanel key={editing?.id ?? 'new'} title={editing ? `Edit model ${editing.makerName} ${editing.name}` : 'Add a model'}>
          {(headingId) => <ModelForm model={editing} labelledBy={headingId} onSaved={onSaved} onCancel={editor.close} />}
        </FormPanel>
      ) : null}
      <ModelsTable onEdit={onEdit} />
    </div>
  );
}
