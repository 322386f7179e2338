import { TextField, type TextFieldProps } from './text-field';

type NumberFieldProps = Omit<TextFieldProps, 'tabular' | 'inputMode' | 'keyboardType'> & {
  /** The unit, shown after the number and read out with the label, e.g. "mm". */
  unit?: string;
  decimal?: boolean;
};

/** A measurement or count in tabular figures, with its unit beside it. */
export function NumberField({ unit, decimal = false, ...props }: NumberFieldProps) {
  return (
    <TextField
      {...props}
      suffix={unit}
      tabular
      inputMode={decimal ? 'decimal' : 'numeric'}
      keyboardType={decimal ? 'decimal-pad' : 'number-pad'}
      autoCorrect={false}
    />
  );
}
