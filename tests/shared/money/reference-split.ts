import { type Terms } from '@/shared/schemas/terms';

/**
 * An independent restatement of the split in docs/money-rules.md in BigInt rational arithmetic, for property
 * tests: each rule computed from its formula, half-up (VATREC12030), VAT never rounded to nil
 * (VAT Notice 700 17.5), the maker's share by subtraction; null when that share would be negative.
 */
export function referenceSplit(terms: Terms, list: number, sale: number) {
  const G = 10000n;
  const r = BigInt(terms.commissionRateBp);
  const v = BigInt(terms.vatRateBp);
  const halfUp = (num: bigint, den: bigint) => (2n * num + den) / (2n * den);
  const vat = (num: bigint, den: bigint, base: bigint) => {
    const value = halfUp(num, den);
    return value === 0n && base > 0n && v > 0n ? 1n : value;
  };
  const L = BigInt(list);
  const S = BigInt(sale);
  const registered = terms.makerVatRegistered;
  const O = registered ? vat(S * v, G + v, S) : 0n;
  const Sn = S - O;
  const Ln = registered ? L - vat(L * v, G + v, L) : L;
  let C: bigint;
  if (terms.discountRule === 'shared') C = halfUp(r * Sn, G);
  else if (terms.discountRule === 'maker') C = halfUp(r * Ln, G);
  else {
    const c = halfUp(r * Ln, G) - (Ln - Sn);
    C = c > 0n ? c : 0n;
  }
  let V = 0n;
  if (terms.commissionVat === 'added') V = vat(C * v, G, C);
  if (terms.commissionVat === 'included') V = vat(C * v, G + v, C);
  const M = S - C - (terms.commissionVat === 'added' ? V : 0n);
  if (M < 0n) return null;
  return {
    commission: Number(C),
    vatOnCommission: Number(V),
    makerShare: Number(M),
    makerOutputVat: Number(O),
    makerReclaimableVat: registered ? Number(V) : 0,
  };
}
