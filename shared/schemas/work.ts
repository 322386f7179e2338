import { z } from 'zod';

/**
 * Where a work is, derived from its latest consignment line (never stored on the work):
 * no line, or a withdrawn one, means it is in the studio.
 */
export const workStatuses = [
  'in-studio',
  'on-consignment',
  'sold',
  'returned',
  'damaged',
  'lost',
] as const;
export const workStatusSchema = z.enum(workStatuses);
export type WorkStatus = z.infer<typeof workStatusSchema>;

export const foodUses = ['food-safe', 'decorative', 'not-stated'] as const;
export const foodUseSchema = z.enum(foodUses);
export type FoodUse = z.infer<typeof foodUseSchema>;
