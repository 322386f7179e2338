import {
  type ConditionDifference,
  type ConditionStage,
  type FindingKind,
} from '../schemas/condition';

/** The trade's words for what an examiner finds on a ceramic piece (docs/condition.md). */
export const findingKindWords: Record<FindingKind, string> = {
  chip: 'Chip',
  crack: 'Crack',
  'hairline-crack': 'Hairline crack',
  crazing: 'Crazing',
  'glaze-fault': 'Glaze fault',
  loss: 'Loss',
  abrasion: 'Abrasion',
  stain: 'Stain',
  'previous-repair': 'Previous repair',
};

export const stageWords: Record<ConditionStage, string> = {
  dispatch: 'At dispatch',
  arrival: 'On arrival',
  return: 'On return',
  claim: 'For a claim',
};

/** One finding in a line of words: "Chip, slight, on the rim, 3 mm". */
export function findingInWords(finding: {
  kind: FindingKind;
  grade: string;
  location: string | null;
  sizeMm: number | null;
}): string {
  return [
    findingKindWords[finding.kind],
    finding.grade,
    finding.location,
    finding.sizeMm === null ? null : `${finding.sizeMm} mm`,
  ]
    .filter(Boolean)
    .join(', ');
}

/** How a later check differs from the dispatch check, in the words the screen and PDF share. */
export const changeWords: Record<ConditionDifference['change'], string> = {
  new: 'New since dispatch',
  changed: 'Changed since dispatch',
  missing: 'Recorded at dispatch, not found now',
};

/** "New since dispatch: Chip, slight, on the rim, 3 mm (was …)". */
export function differenceInWords(difference: ConditionDifference): string {
  const was =
    difference.before && difference.change === 'changed'
      ? ` (was ${findingInWords(difference.before)})`
      : '';
  return `${changeWords[difference.change]}: ${findingInWords(difference.finding)}${was}`;
}
