export type SelectOption = { value: string; label: string };

export type SelectProps = {
  label: string;
  options: readonly SelectOption[];
  /** '' is the first, "any" option. */
  value: string;
  onChange: (value: string) => void;
  testID: string;
  /** The label of the empty choice, e.g. "Any status". */
  emptyLabel?: string;
};
