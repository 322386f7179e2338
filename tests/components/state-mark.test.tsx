import { render, screen } from '@testing-library/react-native';

import { StateMark } from '@/components/ui/state-mark';
import {
  consignmentStateLooks,
  lineStateLooks,
  type StateLook,
  workStatusLooks,
} from '@/constants/states';
import { consignmentStates, lineStates } from '@/shared/schemas/consignment';
import { workStatuses } from '@/shared/schemas/work';

const tables: [string, readonly string[], Record<string, StateLook>][] = [
  ['work statuses', workStatuses, workStatusLooks],
  ['consignment states', consignmentStates, consignmentStateLooks],
  ['line states', lineStates, lineStateLooks],
];

// The glyph is hidden from screen readers (the word says the same), so queries must look for it.
const hidden = { includeHiddenElements: true };

describe('StateMark', () => {
  it('shows the state as a word with its shape beside it', () => {
    render(<StateMark look={workStatusLooks['on-consignment']} testID="mark" />);

    expect(screen.getByTestId('mark')).toHaveTextContent('On consignment');
    expect(screen.getByTestId('state-glyph-dot', hidden)).toBeTruthy();
  });

  it('draws a different shape for a different state', () => {
    render(<StateMark look={workStatusLooks.sold} />);

    expect(screen.getByText('Sold')).toBeTruthy();
    expect(screen.getByTestId('state-glyph-square', hidden)).toBeTruthy();
    expect(screen.queryByTestId('state-glyph-dot', hidden)).toBeNull();
  });

  it.each(tables)(
    'gives every one of the %s its own word and its own shape',
    (_name, states, looks) => {
      const words = states.map((state) => looks[state]?.word);
      const shapes = states.map((state) => looks[state]?.shape);

      expect(words.every((word) => typeof word === 'string' && word.length > 0)).toBe(true);
      expect(new Set(words).size).toBe(states.length);
      // Distinct shapes mean no two states are told apart by colour alone.
      expect(new Set(shapes).size).toBe(states.length);
    },
  );
});
