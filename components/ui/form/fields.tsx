import {
  type Control,
  type FieldPathByValue,
  type FieldValues,
  useController,
} from 'react-hook-form';

import { Choice, type ChoiceOption } from '../choice';
import { DateField } from '../date-field';
import { MoneyField } from '../money-field';
import { NumberField } from '../number-field';
import { Select, type SelectOption } from '../select';
import { TextField, type TextFieldProps } from '../text-field';

/** What every bound field takes: the form's control and the name of a field holding text. */
type Bound<Values extends FieldValues, Body> = {
  control: Control<Values, unknown, Body>;
  name: FieldPathByValue<Values, string>;
  label: string;
  testID: string;
  hint?: string;
};

type TextLike = Omit<
  TextFieldProps,
  'value' | 'onChangeText' | 'onBlur' | 'error' | 'ref' | 'label' | 'testID' | 'hint'
>;

function useBoundText<Values extends FieldValues, Body>(props: Bound<Values, Body>) {
  const { field, fieldState } = useController({ control: props.control, name: props.name });
  return {
    ref: field.ref,
    testID: props.testID,
    label: props.label,
    hint: props.hint,
    // The name is a path whose value is text, so the value is the text typed.
    value: field.value as string,
    onChangeText: field.onChange,
    onBlur: field.onBlur,
    error: fieldState.error?.message,
  };
}

/** Text, as typed. */
export function FormText<Values extends FieldValues, Body>({
  control,
  name,
  label,
  testID,
  hint,
  ...input
}: Bound<Values, Body> & TextLike) {
  const bound = useBoundText({ control, name, label, testID, hint });
  return <TextField {...input} {...bound} />;
}

/** What an e-mail address field tells the keyboard, autofill and autocorrect. */
export const emailInput = {
  autoCapitalize: 'none',
  autoComplete: 'email',
  autoCorrect: false,
  inputMode: 'email',
  keyboardType: 'email-address',
  textContentType: 'emailAddress',
} as const;

/** An amount in major units, with the currency's symbol. */
export function FormMoney<Values extends FieldValues, Body>({
  currency,
  ...props
}: Bound<Values, Body> & { currency: string }) {
  return <MoneyField {...useBoundText(props)} currency={currency} />;
}

/** A number, with its unit beside it. */
export function FormNumber<Values extends FieldValues, Body>({
  unit,
  decimal,
  ...props
}: Bound<Values, Body> & { unit?: string; decimal?: boolean }) {
  return <NumberField {...useBoundText(props)} unit={unit} decimal={decimal} />;
}

/**
 * A size or weight, which may be typed with its unit ("1.2 kg"): a text keyboard, and the field's
 * own unit beside it for a bare number.
 */
export function FormMeasure<Values extends FieldValues, Body>({
  unit,
  ...props
}: Bound<Values, Body> & { unit: string }) {
  const bound = useBoundText(props);
  return (
    <TextField
      {...bound}
      // Once a unit is typed, the field's own would contradict it; '' keeps the frame in place.
      suffix={/[a-z]/i.test(bound.value) ? '' : unit}
      tabular
      autoCapitalize="none"
      autoCorrect={false}
    />
  );
}

/** A calendar date. */
export function FormDate<Values extends FieldValues, Body>(props: Bound<Values, Body>) {
  const { label, testID, hint, value, onChangeText, onBlur, error } = useBoundText(props);
  return <DateField {...{ label, testID, hint, value, onBlur, error }} onChange={onChangeText} />;
}

/** One of many choices, in a drop-down (the browser's own on the web). */
export function FormSelect<Values extends FieldValues, Body>({
  options,
  emptyLabel,
  ...props
}: Bound<Values, Body> & { options: readonly SelectOption[]; emptyLabel?: string }) {
  const { field, fieldState } = useController({ control: props.control, name: props.name });
  return (
    <Select
      testID={props.testID}
      label={props.label}
      options={options}
      emptyLabel={emptyLabel}
      value={field.value as string}
      onChange={field.onChange}
      error={fieldState.error?.message}
    />
  );
}

/** One of a few choices, all in view. */
export function FormChoice<Values extends FieldValues, Body>({
  options,
  ...props
}: Bound<Values, Body> & { options: readonly ChoiceOption<string>[] }) {
  const { field, fieldState } = useController({ control: props.control, name: props.name });
  return (
    <Choice
      testID={props.testID}
      label={props.label}
      hint={props.hint}
      options={options}
      value={field.value as string}
      onChange={field.onChange}
      error={fieldState.error?.message}
    />
  );
}
