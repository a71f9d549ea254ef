import type { Ref, SelectHTMLAttributes } from 'react';
import { SelectField } from '#src/components/select-field.tsx';
import { MODEL_OPTIONS_LIMIT, useModelOptions } from '../api/get-model-options.ts';

type Props = Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> & {
  error?: string;
  ref?: Ref<HTMLSelectElement>;
  label?: string;
  /** The first option: "choose" in the form, "all models" in a filter. */
  emptyLabel?: string;
};

/** A select of the catalogue's models ("Maker Model"), loaded with its own small request. */
export function ModelSelect({ error, label = 'Model', emptyLabel = 'Choose a model', ...rest }: Props) {
  const models = useModelOptions();
  const options = models.data
    ? [{ value: '', label: emptyLabel }, ...models.data.options]
    : [{ value: '', label: models.isError ? 'Models could not be loaded' : 'Loading models…' }];
  const hint = models.isError
    ? 'The list of models could not be loaded; reload the page to try again.'
    : models.data?.truncated
      ? `The first ${MODEL_OPTIONS_LIMIT} models by maker.`
      : undefined;
  return <SelectField label={label} options={options} hint={hint} error={error} disabled={!models.data} {...rest} />;
}
