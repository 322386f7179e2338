import { overallGrade } from '@/shared/schemas/condition';

// Collections Trust, Spectrum "Condition": the overall condition of an object is the same as its
// most serious individual condition.
describe('overallGrade', () => {
  it('is the most serious finding’s grade, and sound with no findings', () => {
    expect(overallGrade([])).toBe('sound');
    expect(overallGrade(['slight'])).toBe('slight');
    expect(overallGrade(['slight', 'serious', 'marked'])).toBe('serious');
    expect(overallGrade(['marked', 'slight'])).toBe('marked');
  });
});
