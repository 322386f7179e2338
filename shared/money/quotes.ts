import {
  type PricePlanRequest,
  type PricePlanResponse,
  type SaleSplit,
  type SplitQuoteRequest,
} from '../schemas/terms';
import { planListPrice } from './price-plan';
import { splitSale } from './split';

/** `POST /api/quotes/split`: one sale's split under the terms (see `splitSale`). */
export function quoteSplit(request: SplitQuoteRequest): SaleSplit {
  return splitSale(request.terms, request.listPrice, request.salePrice);
}

/** `POST /api/quotes/price-plan`: the planned list price and a full-price sale's split at it. */
export function quotePricePlan(request: PricePlanRequest): PricePlanResponse {
  const listPrice = planListPrice(request.terms, request.wantedNet, request.step);
  return { listPrice, split: splitSale(request.terms, listPrice, listPrice) };
}
