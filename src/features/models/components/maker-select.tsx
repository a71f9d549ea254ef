import type { SelectHTMLAttributes, Ref } from 'react';
import { SelectField } from '#src/components/select-field.tsx';
import { MAKER_OPTIONS_LIMIT, useMakerOptions } from '../api/get-maker-options.ts';

type Props = Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> & {
  error?: string;
  ref?: Ref<HTMLSelectElement>;
  label?: string;
  /** The first option: '' for "choose" in the form, "all makers" in a filter. */
  emptyLabel?: string;
};

/** A select of the catalogue's makers, by name, loaded with its own small request. */
export function MakerSelect({ error, label = 'Maker', emptyLabel = 'Choose a maker', ...rest }: Props) {
  const makers = useMakerOptions();
  const options = makers.data ? [{ value: '', label: emptyLabel }, ...makers.data.options] : [{ value: '', label: makers.isError ? 'Makers could not be loaded' : 'Loading makers…' }];
  const hint = makers.isError
    ? 'The list of makers could not be loaded; reload the page to try again.'
    : makers.data?.truncated
      ? `The first ${MAKER_OPTIONS_LIMIT} makers by name.`
      : undefined;
  return <SelectField label={label} options={options} hint={hint} error={error} disabled={!makers.data} {...rest} />;
}
