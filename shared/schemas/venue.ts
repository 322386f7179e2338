import { z } from 'zod';

export const venueKinds = ['gallery', 'shop', 'fair', 'exhibition', 'open-studio'] as const;
export const venueKindSchema = z.enum(venueKinds);
export type VenueKind = z.infer<typeof venueKindSchema>;
