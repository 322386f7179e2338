import { netSummaryText } from '@/components/screens/terms-form/net-summary';
import { termsValues } from '@/components/screens/terms-form/terms-form-values';
import { defaultTerms } from '@/shared/schemas/terms';

const usual = termsValues(defaultTerms);

// Worked examples from docs/money-rules.md ("Worked examples"), same as the full preview's.
describe('netSummaryText, the one-line net preview that stays in view on a phone', () => {
  it('says what the maker receives on the sample sale (40% shared, no VAT, £100: £60)', () => {
    expect(netSummaryText(usual, '100')).toBe('On £100.00 you receive £60.00');
  });

  it('follows the terms as they change (40% plus 20% VAT on top of £100: £52)', () => {
    expect(netSummaryText({ ...usual, commissionVat: 'added' }, '100')).toBe(
      'On £100.00 you receive £52.00',
    );
  });

  it('adds the net after VAT for a registered maker (50% + VAT, £600: receives £300, nets £250)', () => {
    const values = {
      ...usual,
      commissionRate: '50',
      commissionVat: 'added' as const,
      makerVatRegistered: 'yes' as const,
    };
    expect(netSummaryText(values, '600')).toBe('On £600.00 you receive £300.00, £250.00 after VAT');
  });

  it('waits for rates it can read and a sample price', () => {
    expect(netSummaryText({ ...usual, commissionRate: '140' }, '100')).toBe(
      'Complete the rates to see your net.',
    );
    expect(netSummaryText(usual, '')).toBe('Enter a sample price below to see the split.');
  });
});
