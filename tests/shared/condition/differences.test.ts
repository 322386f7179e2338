import { conditionDifferences, isNewDamage } from '@/shared/condition/differences';
import { type Finding } from '@/shared/schemas/condition';

let nextId = 1;
const finding = (f: Partial<Finding> & Pick<Finding, 'kind' | 'grade'>): Finding => ({
  id: nextId++,
  location: null,
  sizeMm: null,
  photoUrl: null,
  notes: null,
  ...f,
});

// Collections Trust, Spectrum "Condition": earlier values are kept so that change shows.
describe('conditionDifferences', () => {
  it('finds nothing when the later check records the same findings', () => {
    const craze = finding({ kind: 'crazing', grade: 'slight', location: 'Inside' });
    const again = { ...craze, id: 99, location: ' inside ' };
    expect(conditionDifferences([craze], [again])).toEqual([]);
  });

  it('flags a new chip, a grown crack and a finding no longer seen', () => {
    const crack = finding({ kind: 'crack', grade: 'slight', location: 'foot', sizeMm: 4 });
    const stain = finding({ kind: 'stain', grade: 'slight', location: 'base' });
    const chip = finding({ kind: 'chip', grade: 'marked', location: 'rim', sizeMm: 3 });
    const longerCrack = { ...crack, id: 50, sizeMm: 9 };
    const differences = conditionDifferences([crack, stain], [chip, longerCrack]);
    expect(differences).toEqual([
      { change: 'new', finding: chip, before: null },
      { change: 'changed', finding: longerCrack, before: crack },
      { change: 'missing', finding: stain, before: stain },
    ]);
    expect(differences.map(isNewDamage)).toEqual([true, true, false]);
  });

  it('does not count a finding that became less serious as new damage', () => {
    const marked = finding({ kind: 'abrasion', grade: 'marked', location: 'body' });
    const slight = { ...marked, id: 77, grade: 'slight' as const };
    const [difference] = conditionDifferences([marked], [slight]);
    expect(difference?.change).toBe('changed');
    expect(isNewDamage(difference!)).toBe(false);
  });
});
