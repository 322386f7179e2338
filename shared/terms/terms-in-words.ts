import { formatMoney } from '../money/format';
import { type Terms } from '../schemas/terms';

/** A rate in basis points as a percentage people write: 4000 → "40%", 1750 → "17.5%". */
export function percent(rateBp: number): string {
  const whole = Math.trunc(rateBp / 100);
  const rest = String(rateBp % 100)
    .padStart(2, '0')
    .replace(/0+$/, '');
  return `${rest === '' ? whole : `${whole}.${rest}`}%`;
}

function commission(terms: Terms): string {
  const rate = percent(terms.commissionRateBp);
  const base = terms.makerVatRegistered
    ? 'of the price paid without the maker’s VAT'
    : 'of the price paid';
  if (terms.commissionVat === 'none') return `Commission: ${rate} ${base}, with no VAT on it.`;
  if (terms.commissionVat === 'added') {
    return `Commission: ${rate} ${base}, with VAT at ${percent(terms.vatRateBp)} added on top.`;
  }
  return `Commission: ${rate} ${base}, VAT at ${percent(terms.vatRateBp)} included in it.`;
}

const discounts: Record<Terms['discountRule'], string> = {
  shared: 'Discounts: shared; commission is on the price actually paid.',
  venue: 'Discounts: borne by the venue; its commission absorbs them.',
  maker: 'Discounts: borne by the maker; commission is on the list price.',
};

function insurance(terms: Terms): string {
  const basis =
    terms.insuranceBasis === 'retail'
      ? 'at the list price'
      : terms.insuranceBasis === 'maker-net'
        ? 'at the maker’s net (list price less commission, without VAT)'
        : `at an agreed value of ${terms.agreedInsuranceValue ? formatMoney(terms.agreedInsuranceValue) : '—'}`;
  const who = (insurer: Terms['insuredBy']) => (insurer === 'venue' ? 'the venue' : 'the maker');
  const places =
    terms.insuredBy === terms.insuredInTransitBy
      ? `by ${who(terms.insuredBy)} on the premises and in transit`
      : `by ${who(terms.insuredBy)} on the premises and ${who(terms.insuredInTransitBy)} in transit`;
  return `Insurance: ${basis}, ${places}.`;
}

function payment(terms: Terms): string {
  const { days, from } = terms.paymentTerms;
  const start =
    from === 'sale'
      ? 'of each sale'
      : from === 'month-end'
        ? 'of the end of the month of sale'
        : 'of the show’s closing';
  return days === 0
    ? `Payment: due on the day ${start.replace(/^of /, '')}.`
    : `Payment: within ${days} days ${start}.`;
}

/**
 * The terms of a consignment in plain words, one sentence each, as the consignment page, the
 * consignment sheet and the statement show them (docs/money-rules.md, "Terms").
 */
export function termsInWords(terms: Terms): string[] {
  return [
    terms.venueRole === 'agent'
      ? 'The venue sells as the maker’s agent.'
      : 'The venue buys the work on sale or return.',
    commission(terms),
    terms.makerVatRegistered
      ? `The maker is VAT-registered: prices include the maker’s VAT at ${percent(terms.vatRateBp)}.`
      : 'The maker is not VAT-registered.',
    discounts[terms.discountRule],
    insurance(terms),
    payment(terms),
  ];
}
