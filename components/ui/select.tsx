import { Choice } from './choice';
import { type SelectProps } from './select.types';

export type { SelectOption, SelectProps } from './select.types';

/** Native stand-in for the web's drop-down: the same options as a radio group. */
export function Select({
  label,
  options,
  value,
  onChange,
  testID,
  emptyLabel,
  error,
}: SelectProps) {
  const all = emptyLabel ? [{ value: '', label: emptyLabel }, ...options] : options;
  return (
    <Choice
      label={label}
      options={all}
      value={value}
      onChange={onChange}
      testID={testID}
      error={error}
    />
  );
}
