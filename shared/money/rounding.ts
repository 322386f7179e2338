import { MoneyRuleError } from './errors';

/** Rates are basis points: 10000 bp is 100%. */
export const BASIS_POINTS = 10000;

/**
 * numerator ÷ denominator rounded half-up to a whole minor unit: under half rounds down, half or
 * more rounds up (HMRC VATREC12030, "round up and down"). Integers only: the quotient from the
 * division is corrected by its remainder, so the result is exact for any safe integer.
 */
export function divideHalfUp(numerator: number, denominator: number): number {
  let quotient = Math.floor(numerator / denominator);
  let remainder = numerator - quotient * denominator;
  if (remainder < 0) {
    quotient -= 1;
    remainder += denominator;
  } else if (remainder >= denominator) {
    quotient += 1;
    remainder -= denominator;
  }
  return remainder * 2 >= denominator ? quotient + 1 : quotient;
}

/** amount × rate, rounded half-up to the minor unit (per line, HMRC VATREC12030). */
export function applyRate(amount: number, rateBp: number): number {
  return divideHalfUp(safeProduct(amount, rateBp), BASIS_POINTS);
}

/** Rounds an amount up to the next multiple of a step (price planning: "rounded up to a price step"). */
export function roundUpToStep(amount: number, step: number): number {
  const steps = Math.ceil(amount / step);
  const candidate = steps * step;
  // Correct the float quotient's ceiling by one step either way, as in divideHalfUp.
  if (candidate - step >= amount) return candidate - step;
  return candidate < amount ? candidate + step : candidate;
}

/** A product of integers, refused when it would leave the range where integers are exact. */
export function safeProduct(a: number, b: number): number {
  const product = a * b;
  if (!Number.isSafeInteger(product)) {
    throw new MoneyRuleError(
      'invalid-amount',
      'That amount is too large for the product to handle.',
    );
  }
  return product;
}
