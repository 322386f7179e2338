import { checkVAT, countries } from 'jsvat';
import { isValid as isUkPostcode, toNormalised } from 'postcode';
import { z } from 'zod';

import { consignmentSummarySchema } from './consignment';
import { termsSchema } from './terms';
import { lineText, optionalText } from './text';

export const venueKinds = ['gallery', 'shop', 'fair', 'exhibition', 'open-studio'] as const;
export const venueKindSchema = z.enum(venueKinds, {
  error: 'Choose gallery, shop, fair, exhibition or open studio.',
});
export type VenueKind = z.infer<typeof venueKindSchema>;

const venueFields = {
  name: lineText('name', 200).min(1, { error: 'Enter the venue’s name.' }),
  kind: venueKindSchema,
  addressLine1: optionalText('address', 200),
  addressLine2: optionalText('address', 200),
  town: optionalText('town', 120),
  postcode: optionalText('postcode', 20),
  /** ISO 3166-1 alpha-2 */
  country: z
    .string()
    .trim()
    .regex(/^[A-Z]{2}$/, { error: 'Use a two-letter country code such as GB.' })
    .nullable()
    .optional(),
  contactName: optionalText('contact name', 200),
  email: z
    .string({ error: 'Enter an e-mail address such as name@example.com.' })
    .trim()
    .transform((v) => (v === '' ? null : v))
    .pipe(z.email({ error: 'Enter an e-mail address such as name@example.com.' }).nullable())
    .nullable()
    .optional(),
  phone: optionalText('phone number', 40),
  vatNumber: optionalText('VAT number', 20),
  defaultTerms: termsSchema,
  notes: optionalText('notes', 4000, 'lines'),
};

type VenueDraft = {
  postcode?: string | null;
  country?: string | null;
  vatNumber?: string | null;
};

/** UK postcodes are checked with the `postcode` package, VAT numbers (GB and EU) with `jsvat`. */
function checkIdentifiers(venue: VenueDraft, ctx: z.RefinementCtx) {
  const country = venue.country ?? 'GB';
  if (venue.postcode && country === 'GB' && !isUkPostcode(venue.postcode)) {
    ctx.addIssue({
      code: 'custom',
      path: ['postcode'],
      message: 'Enter a UK postcode such as IP15 5AB.',
    });
  }
  if (venue.vatNumber && !checkVAT(venue.vatNumber, countries).isValid) {
    ctx.addIssue({
      code: 'custom',
      path: ['vatNumber'],
      message: 'That is not a valid VAT number; check the country letters and digits.',
    });
  }
}

/** Postcodes in their usual spaced capitals; VAT numbers without spaces. */
function normalise<T extends VenueDraft>(venue: T): T {
  const country = venue.country ?? 'GB';
  return {
    ...venue,
    ...(venue.postcode && country === 'GB'
      ? { postcode: toNormalised(venue.postcode) ?? venue.postcode }
      : {}),
    ...(venue.vatNumber ? { vatNumber: venue.vatNumber.replace(/[\s.-]/g, '').toUpperCase() } : {}),
  };
}

/** `POST /api/venues`; without terms the venue starts from the studio's default terms. */
export const venueCreateSchema = z
  .strictObject({ ...venueFields, defaultTerms: termsSchema.optional() })
  .superRefine(checkIdentifiers)
  .transform(normalise);
export type VenueCreate = z.input<typeof venueCreateSchema>;
export type VenueCreateParsed = z.output<typeof venueCreateSchema>;

/**
 * `PATCH /api/venues/:id`. A postcode sent without the country is checked (and normalised) by the
 * server against the venue's stored country, not taken to be British here.
 */
export const venueUpdateSchema = z
  .strictObject(venueFields)
  .partial()
  .superRefine((venue, ctx) =>
    checkIdentifiers(venue.country === undefined ? { ...venue, postcode: null } : venue, ctx),
  )
  .transform((venue) =>
    venue.country === undefined
      ? { ...normalise({ ...venue, postcode: null }), postcode: venue.postcode }
      : normalise(venue),
  );
export type VenueUpdate = z.input<typeof venueUpdateSchema>;
export type VenueUpdateParsed = z.output<typeof venueUpdateSchema>;

export const venueSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  kind: venueKindSchema,
  addressLine1: z.string().nullable(),
  addressLine2: z.string().nullable(),
  town: z.string().nullable(),
  postcode: z.string().nullable(),
  country: z.string().nullable(),
  contactName: z.string().nullable(),
  email: z.string().nullable(),
  phone: z.string().nullable(),
  vatNumber: z.string().nullable(),
  defaultTerms: termsSchema,
  notes: z.string().nullable(),
  archivedAt: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Venue = z.infer<typeof venueSchema>;

export const venueListSchema = z.object({
  items: z.array(venueSchema),
  total: z.number().int(),
});
export type VenueList = z.infer<typeof venueListSchema>;

/** `GET /api/venues/:id`: the venue, its consignments and who may sign in for it. */
export const venueDetailSchema = z.object({
  venue: venueSchema,
  consignments: z.array(consignmentSummarySchema),
  staff: z.array(z.object({ userId: z.string(), name: z.string(), email: z.string() })),
});
export type VenueDetail = z.infer<typeof venueDetailSchema>;

/** `GET /api/venues` */
export const venueListQuerySchema = z.strictObject({
  archived: z
    .enum(['exclude', 'include', 'only'], { error: 'Choose exclude, include or only.' })
    .default('exclude'),
});
export type VenueListQuery = z.input<typeof venueListQuerySchema>;
