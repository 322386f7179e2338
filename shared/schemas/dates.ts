import { z } from 'zod';

/** A calendar date written YYYY-MM-DD (ISO 8601), a real one. */
export const isoDateSchema = z.iso.date({ error: 'Enter a date such as 2026-11-28.' });
