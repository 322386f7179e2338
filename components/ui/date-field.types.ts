export type DateFieldProps = {
  label: string;
  /** YYYY-MM-DD, or '' for none. */
  value: string;
  onChange: (value: string) => void;
  onBlur?: () => void;
  testID: string;
  hint?: string;
  error?: string;
};
