import { type StudioSettings } from '@/shared/schemas/studio';
import { defaultTerms, type Terms, termsSchema } from '@/shared/schemas/terms';

import { type Studio } from './studio.repository';

/** The terms a new venue starts from: the studio's own, or the product's in its currency. */
export function studioDefaultTerms(studio: Studio): Terms {
  if (studio.default_terms) return termsSchema.parse(JSON.parse(studio.default_terms));
  return {
    ...defaultTerms,
    paymentTerms: { ...defaultTerms.paymentTerms },
    currency: studio.currency,
  };
}

export function toStudioSettings(studio: Studio, nextStockNumber: string): StudioSettings {
  return {
    id: studio.id,
    name: studio.name,
    currency: studio.currency,
    locale: studio.locale,
    timeZone: studio.time_zone,
    vatNumber: studio.vat_number,
    stockNumberPattern: studio.stock_number_pattern,
    priceStep: studio.price_step,
    nextStockNumber,
  };
}
