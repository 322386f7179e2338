import { z } from 'zod';

/** A password a person chooses: long enough to be hard to guess, short enough to type. */
export const newPasswordSchema = z
  .string({ error: 'Choose a password.' })
  .min(10, { error: 'Use at least 10 characters for the password.' })
  .max(128, { error: 'Keep the password to 128 characters or fewer.' });
