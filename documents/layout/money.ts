import { formatMoney } from '@/shared/money/format';
import { type Money } from '@/shared/schemas/money';

import { type Box, figures } from './boxes';
import { type } from './style';

/** A money cell: the amount as formatMoney writes it, in tabular figures, right-aligned. */
export function moneyCell(money: Money, locale: string, strong = false): Box {
  return figures(formatMoney(money, locale), strong ? type.cellFigureStrong : type.cellFigure);
}
