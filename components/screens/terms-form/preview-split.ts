import { parseMoneyText } from '@/components/ui/decimal-text';
import { trySplitSale } from '@/shared/money/split';
import { type Money } from '@/shared/schemas/money';
import { type SaleSplit, type Terms } from '@/shared/schemas/terms';

import { previewTerms, type TermsFormValues } from './terms-form-values';

/** The sample sale a preview starts from, in major units. */
export const firstSample = '100';

export type PreviewSplit =
  | { kind: 'incomplete' }
  | { kind: 'no-sample' }
  | { kind: 'share-below-zero' }
  | { kind: 'split'; terms: Terms; sample: Money; split: SaleSplit };

/**
 * A sample sale split under the terms as they stand in the form, by the shared money engine: the
 * full preview and the phone's summary bar read the same answer.
 */
export function previewSplit(values: TermsFormValues, sampleText: string): PreviewSplit {
  const terms = previewTerms(values);
  if (terms === null) return { kind: 'incomplete' };
  const sample = parseMoneyText(sampleText, terms.currency);
  if (sample.kind !== 'ok') return { kind: 'no-sample' };
  const split = trySplitSale(terms, sample.value, sample.value);
  if (split === null) return { kind: 'share-below-zero' };
  return { kind: 'split', terms, sample: sample.value, split };
}
