import { bindForm } from '@/components/ui/form/binding';
import { choiceCodec, dateCodec, numberCodec, textCodec } from '@/components/ui/form/codecs';
import {
  type ConsignmentCreateParsed,
  consignmentCreateSchema,
} from '@/shared/schemas/consignment';
import { type Terms } from '@/shared/schemas/terms';

import { termsFields, type TermsFormValues, termsValues } from '../terms-form/terms-form-values';

/** A new consignment as the form holds it: the venue, title, dates, and terms if they differ. */
export type ConsignmentFormValues = TermsFormValues & {
  venueId: string;
  title: string;
  dispatchDate: string;
  openingDate: string;
  closingDate: string;
  returnDueDate: string;
  /** `yes` when this consignment's terms differ from the venue's; only the owner sets them. */
  ownTerms: 'yes' | 'no';
};

export function newConsignmentValues(venueId: number | null, terms: Terms): ConsignmentFormValues {
  return {
    venueId: venueId === null ? '' : String(venueId),
    title: '',
    dispatchDate: '',
    openingDate: '',
    closingDate: '',
    returnDueDate: '',
    ownTerms: 'no',
    ...termsValues(terms),
  };
}

/** The venue's terms are copied by the server unless the owner sets others here. */
export const consignmentCreateBinding = bindForm<ConsignmentFormValues, ConsignmentCreateParsed>(
  consignmentCreateSchema,
  {
    venueId: { read: numberCodec, blank: { required: 'Choose the venue.' } },
    title: { read: textCodec, blank: { required: 'Give the show or batch a title.' } },
    dispatchDate: { read: dateCodec },
    openingDate: { read: dateCodec },
    closingDate: { read: dateCodec },
    returnDueDate: { read: dateCodec },
    ownTerms: { read: choiceCodec, when: () => false },
    ...termsFields<ConsignmentFormValues>('terms.', (values) => values.ownTerms === 'yes'),
  },
);
