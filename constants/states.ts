import { type ConditionGrade } from '@/shared/schemas/condition';
import { type ConsignmentState, type LineState } from '@/shared/schemas/consignment';
import { type OutboxState } from '@/shared/schemas/outbox';
import { type StatementState } from '@/shared/schemas/statement';
import { type WorkStatus } from '@/shared/schemas/work';

import { type StateTone } from './theme';

/** Glyphs drawn beside a state's word, so that no state is told apart by colour alone. */
export const stateShapes = [
  'ring',
  'dot',
  'half',
  'square',
  'open-square',
  'diamond',
  'triangle-right',
  'triangle-left',
  'bar',
  'cross',
] as const;
export type StateShape = (typeof stateShapes)[number];

export type StateLook = { word: string; shape: StateShape; tone: StateTone };

/** Within each table every state has its own word and its own shape. */
export const workStatusLooks: Record<WorkStatus, StateLook> = {
  'in-studio': { word: 'In the studio', shape: 'open-square', tone: 'quiet' },
  'on-consignment': { word: 'On consignment', shape: 'dot', tone: 'active' },
  sold: { word: 'Sold', shape: 'square', tone: 'done' },
  returned: { word: 'Returned', shape: 'triangle-left', tone: 'quiet' },
  damaged: { word: 'Damaged', shape: 'diamond', tone: 'attention' },
  lost: { word: 'Lost', shape: 'cross', tone: 'danger' },
};

export const consignmentStateLooks: Record<ConsignmentState, StateLook> = {
  draft: { word: 'Being put together', shape: 'ring', tone: 'quiet' },
  agreed: { word: 'Terms agreed', shape: 'half', tone: 'active' },
  dispatched: { word: 'Sent', shape: 'triangle-right', tone: 'active' },
  'on-show': { word: 'On show', shape: 'dot', tone: 'active' },
  closed: { word: 'Show closed', shape: 'bar', tone: 'attention' },
  settled: { word: 'Settled', shape: 'square', tone: 'done' },
  cancelled: { word: 'Cancelled', shape: 'cross', tone: 'quiet' },
};

export const lineStateLooks: Record<LineState, StateLook> = {
  consigned: { word: 'Out', shape: 'dot', tone: 'active' },
  sold: { word: 'Sold', shape: 'square', tone: 'done' },
  returned: { word: 'Returned', shape: 'triangle-left', tone: 'quiet' },
  damaged: { word: 'Damaged', shape: 'diamond', tone: 'attention' },
  lost: { word: 'Lost', shape: 'cross', tone: 'danger' },
  withdrawn: { word: 'Withdrawn', shape: 'bar', tone: 'quiet' },
};

/**
 * A message in the outbox. A waiting message that has already failed once is shown apart from
 * one not yet tried: the maker should see that the mail server is refusing or out of reach.
 */
export const outboxStateLooks: Record<OutboxState | 'retrying', StateLook> = {
  queued: { word: 'Waiting to go', shape: 'ring', tone: 'quiet' },
  retrying: { word: 'Trying again', shape: 'triangle-right', tone: 'attention' },
  sent: { word: 'Sent', shape: 'square', tone: 'done' },
  failed: { word: 'Not sent', shape: 'cross', tone: 'danger' },
};

/** A condition check's overall grade, by word and shape (the worst finding decides it). */
export const conditionGradeLooks: Record<ConditionGrade, StateLook> = {
  sound: { word: 'Sound', shape: 'ring', tone: 'done' },
  slight: { word: 'Slight', shape: 'dot', tone: 'quiet' },
  marked: { word: 'Marked', shape: 'diamond', tone: 'attention' },
  serious: { word: 'Serious', shape: 'cross', tone: 'danger' },
};

/** A step of a consignment's life on its page: done, the one to do next, or still to come. */
export type StepStatus = 'done' | 'current' | 'todo' | 'later';
export const stepLooks: Record<StepStatus, StateLook> = {
  done: { word: 'Done', shape: 'square', tone: 'done' },
  current: { word: 'Next', shape: 'triangle-right', tone: 'active' },
  todo: { word: 'To do', shape: 'open-square', tone: 'quiet' },
  later: { word: 'Later', shape: 'ring', tone: 'quiet' },
};

/** A statement: being drawn up, sent to the venue, paid in full, or called off. */
export const statementStateLooks: Record<StatementState, StateLook> = {
  draft: { word: 'Draft', shape: 'ring', tone: 'quiet' },
  issued: { word: 'Issued, awaiting payment', shape: 'triangle-right', tone: 'active' },
  settled: { word: 'Settled', shape: 'square', tone: 'done' },
  void: { word: 'Void', shape: 'cross', tone: 'quiet' },
};
