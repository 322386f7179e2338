import { type FoodUse } from '../schemas/work';

/** How each food-use answer reads; "not stated" reads as decorative, the safe default. */
export const foodUseWords: Record<FoodUse, string> = {
  'food-safe': 'Food-safe, as declared by the maker',
  decorative: 'Decorative — not for food use',
  'not-stated': 'Decorative — not for food use',
};

/** What the product says about a maker's food-safe declaration: theirs, not Saggar's. */
export const foodSafeNote =
  'This is the maker’s own declaration; Saggar does not test glazes. Food-contact ceramics must ' +
  'meet the lead and cadmium release limits (EU Directive 84/500/EEC; in Great Britain the ' +
  'Materials and Articles in Contact with Food Regulations 2012), tested to ISO 6486-1 or EN 1388, ' +
  'and the rules wherever the piece is sold.';
