/** Why the engine refused a figure; the server answers each with a 400 and the message. */
export const moneyRuleCodes = [
  'currency-mismatch',
  'invalid-amount',
  'invalid-rate',
  'sale-above-list',
  'negative-maker-share',
  'missing-agreed-value',
  'net-unreachable',
  'invalid-date',
  'closing-date-required',
  'threshold-unknown',
] as const;
export type MoneyRuleCode = (typeof moneyRuleCodes)[number];

/** A money rule refused its input; `message` is a plain sentence for the person who entered it. */
export class MoneyRuleError extends Error {
  readonly code: MoneyRuleCode;

  constructor(code: MoneyRuleCode, message: string) {
    super(message);
    this.name = 'MoneyRuleError';
    this.code = code;
  }
}
