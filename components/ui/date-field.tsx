import { type DateFieldProps } from './date-field.types';
import { TextField } from './text-field';

export type { DateFieldProps } from './date-field.types';

/** A calendar date typed as YYYY-MM-DD; the web has the browser's own date picker instead. */
export function DateField({ value, onChange, hint, ...props }: DateFieldProps) {
  return (
    <TextField
      {...props}
      hint={hint ?? 'As year-month-day, such as 2026-11-28.'}
      value={value}
      onChangeText={onChange}
      placeholder="YYYY-MM-DD"
      inputMode="numeric"
      autoCorrect={false}
      maxLength={10}
      tabular
    />
  );
}
