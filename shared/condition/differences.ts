import { type ConditionDifference, conditionGrades, type Finding } from '../schemas/condition';

const place = (f: Finding) => (f.location ?? '').trim().toLowerCase();
const rank = (f: Finding) => conditionGrades.indexOf(f.grade);

/**
 * What a later check (arrival, return) shows that the dispatch check did not: earlier reports are
 * kept so that change shows (Collections Trust, Spectrum, "Condition"). Findings are matched by
 * kind and place on the piece; a match with another grade or size is `changed`, a later finding
 * with no match is `new`, and a dispatch finding no longer found is `missing`.
 */
export function conditionDifferences(
  dispatch: readonly Finding[],
  later: readonly Finding[],
): ConditionDifference[] {
  const unmatched = [...dispatch];
  const differences: ConditionDifference[] = [];
  for (const finding of later) {
    const index = unmatched.findIndex(
      (d) => d.kind === finding.kind && place(d) === place(finding),
    );
    if (index === -1) {
      differences.push({ change: 'new', finding, before: null });
      continue;
    }
    const [before] = unmatched.splice(index, 1);
    if (before!.grade !== finding.grade || before!.sizeMm !== finding.sizeMm) {
      differences.push({ change: 'changed', finding, before: before! });
    }
  }
  for (const before of unmatched) differences.push({ change: 'missing', finding: before, before });
  return differences;
}

/** Whether a difference is new damage: a new finding, or a known one grown worse or larger. */
export function isNewDamage(difference: ConditionDifference): boolean {
  if (difference.change === 'new') return true;
  if (difference.change !== 'changed' || !difference.before) return false;
  return (
    rank(difference.finding) > rank(difference.before) ||
    (difference.finding.sizeMm ?? 0) > (difference.before.sizeMm ?? 0)
  );
}
