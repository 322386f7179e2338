import { type adjustmentKinds, type PaymentMethod } from '@/shared/schemas/statement';

export const paymentMethodWords: Record<PaymentMethod, string> = {
  'bank-transfer': 'bank transfer',
  cheque: 'cheque',
  cash: 'cash',
  online: 'online',
};

type AdjustmentKind = (typeof adjustmentKinds)[number];

/** What explains part of a difference between the statement and what was paid. */
export const adjustmentKindWords: Record<AdjustmentKind, string> = {
  'unreported-sale': 'A sale the venue did not report',
  'discount-not-agreed': 'A discount not agreed',
  'fee-deducted': 'A fee the venue deducted',
  rounding: 'Rounding',
  other: 'Other',
};
