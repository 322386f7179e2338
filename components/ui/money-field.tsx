import { currencySymbol } from './format';
import { TextField, type TextFieldProps } from './text-field';

type MoneyFieldProps = Omit<TextFieldProps, 'prefix' | 'tabular' | 'inputMode' | 'keyboardType'> & {
  /** ISO 4217 code; its symbol is shown before the amount. */
  currency: string;
};

/**
 * An amount typed in major units ("45.50"). The text stays as typed; `parseMoneyText` turns it
 * into exact minor units when the form is checked.
 */
export function MoneyField({ currency, ...props }: MoneyFieldProps) {
  return (
    <TextField
      {...props}
      prefix={currencySymbol(currency)}
      tabular
      inputMode="decimal"
      keyboardType="decimal-pad"
      autoCorrect={false}
    />
  );
}
