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
  /** What is wrong with the choice, in plain words, shown under it. */
  error?: string;
};
