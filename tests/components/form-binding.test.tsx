import { z } from 'zod';

import { bindForm } from '@/components/ui/form/binding';
import { choiceCodec, moneyCodec, numberCodec, textCodec } from '@/components/ui/form/codecs';

const schema = z.strictObject({
  title: z.string().min(1, { error: 'Enter a title.' }),
  year: z.number().int().nullable(),
  terms: z.strictObject({
    price: z.strictObject({ amount: z.number().int().max(100_00), currency: z.string() }),
    basis: z.enum(['retail', 'agreed']),
  }),
  agreed: z.number().optional(),
});
type Values = {
  title: string;
  year: string;
  price: string;
  basis: 'retail' | 'agreed';
  agreed: string;
};

const binding = bindForm<Values, z.output<typeof schema>>(schema, {
  title: { read: textCodec, blank: { required: 'Enter a title.' } },
  year: { read: numberCodec },
  price: { read: moneyCodec('GBP'), path: 'terms.price', blank: { required: 'Enter a price.' } },
  basis: { read: choiceCodec, path: 'terms.basis' },
  agreed: { read: numberCodec, when: (values) => values.basis === 'agreed', blank: 'omit' },
});

const resolve = (values: Values) => binding.resolver(values, undefined, {} as never);

describe('bindForm', () => {
  it('reads text into the request body, nested where the field says, blank as null', async () => {
    const result = await resolve({
      title: 'Jug',
      year: '',
      price: '12.50',
      basis: 'retail',
      agreed: '7',
    });
    expect(result).toEqual({
      values: {
        title: 'Jug',
        year: null,
        terms: { price: { amount: 1250, currency: 'GBP' }, basis: 'retail' },
      },
      errors: {},
    });
  });

  it('sends a field only when its condition holds', () => {
    const { body } = binding.toBody({
      title: 'Jug',
      year: '2026',
      price: '1',
      basis: 'agreed',
      agreed: '7',
    });
    expect(body.agreed).toBe(7);
  });

  it('puts unreadable text, blanks that are required and the schema’s messages on their fields', async () => {
    const result = await resolve({
      title: '',
      year: 'soon',
      price: '200',
      basis: 'retail',
      agreed: '',
    });
    expect(result.values).toEqual({});
    expect(result.errors).toEqual({
      title: { type: 'parse', message: 'Enter a title.' },
      year: expect.objectContaining({ message: expect.stringMatching(/number/i) }),
      // The schema's issue is at terms.price.amount: it lands on the field holding terms.price.
      price: expect.objectContaining({ message: expect.any(String) }),
    });
  });

  it('finds the field for a server path, deeper or shallower than the field', () => {
    expect(binding.fieldFor('terms.price.amount')).toBe('price');
    expect(binding.fieldFor('terms')).toBe('price');
    expect(binding.fieldFor('terms.basis')).toBe('basis');
    expect(binding.fieldFor('nothing')).toBeUndefined();
  });
});
