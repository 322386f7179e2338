import { zodResolver } from '@hookform/resolvers/zod';
import { type Resolver } from 'react-hook-form';

import {
  moneyText,
  numberText,
  parseMoneyText,
  wholeNumberValue,
} from '@/components/ui/decimal-text';
import { liftErrors, messagesToErrors } from '@/components/ui/form-errors';
import {
  type FoodUse,
  type Work,
  type WorkCreateParsed,
  workCreateSchema,
  type WorkUpdateParsed,
  workUpdateSchema,
} from '@/shared/schemas/work';
import { importFields } from '@/shared/schemas/work-import';

/** What the form holds: text as typed, turned into the shared schema's shape when checked. */
export type WorkFormValues = {
  stockNumber: string;
  title: string;
  year: string;
  series: string;
  category: string;
  clayBody: string;
  glaze: string;
  firingTempC: string;
  atmosphere: string;
  kiln: string;
  heightMm: string;
  widthMm: string;
  depthMm: string;
  weightG: string;
  retailPrice: string;
  costPrice: string;
  foodUse: FoodUse;
  careNotes: string;
  notes: string;
};
export type WorkField = keyof WorkFormValues;

/** Every field of the form is one a spreadsheet column can map to, and the other way round. */
const workFields: readonly WorkField[] = importFields;

const numberFields = ['year', 'firingTempC', 'heightMm', 'widthMm', 'depthMm', 'weightG'] as const;
const textFields = [
  'title',
  'series',
  'category',
  'clayBody',
  'glaze',
  'atmosphere',
  'kiln',
  'careNotes',
  'notes',
] as const;

export function emptyWorkValues(stockNumber = ''): WorkFormValues {
  return {
    stockNumber,
    title: '',
    year: String(new Date().getFullYear()),
    series: '',
    category: '',
    clayBody: '',
    glaze: '',
    firingTempC: '',
    atmosphere: '',
    kiln: '',
    heightMm: '',
    widthMm: '',
    depthMm: '',
    weightG: '',
    retailPrice: '',
    costPrice: '',
    foodUse: 'not-stated',
    careNotes: '',
    notes: '',
  };
}

export function workValues(work: Work): WorkFormValues {
  return {
    stockNumber: work.stockNumber,
    title: work.title,
    year: numberText(work.year),
    series: work.series ?? '',
    category: work.category ?? '',
    clayBody: work.clayBody ?? '',
    glaze: work.glaze ?? '',
    firingTempC: numberText(work.firingTempC),
    atmosphere: work.atmosphere ?? '',
    kiln: work.kiln ?? '',
    heightMm: numberText(work.heightMm),
    widthMm: numberText(work.widthMm),
    depthMm: numberText(work.depthMm),
    weightG: numberText(work.weightG),
    retailPrice: moneyText(work.retailPrice),
    costPrice: moneyText(work.costPrice),
    foodUse: work.foodUse,
    careNotes: work.careNotes ?? '',
    notes: work.notes ?? '',
  };
}

type Converted = { input: Record<string, unknown>; messages: Record<string, string> };

/**
 * The form's text as the request body: numbers as numbers, amounts in exact minor units, a blank
 * stock number left out on create so the server makes one. Text that cannot be read as a number
 * or an amount gets a message here; everything else is the shared schema's to judge.
 */
export function toWorkInput(
  values: WorkFormValues,
  currency: string,
  mode: 'create' | 'update',
): Converted {
  const input: Record<string, unknown> = {};
  const messages: Record<string, string> = {};
  const stockNumber = values.stockNumber.trim();
  if (mode === 'update' || stockNumber !== '') input.stockNumber = stockNumber;
  for (const field of textFields) input[field] = values[field];
  for (const field of numberFields) input[field] = wholeNumberValue(values[field]);
  input.foodUse = values.foodUse;

  const retail = parseMoneyText(values.retailPrice, currency);
  if (retail.kind === 'ok') input.retailPrice = retail.value;
  else messages.retailPrice = retail.kind === 'empty' ? 'Enter the retail price.' : retail.message;

  const cost = parseMoneyText(values.costPrice, currency);
  if (cost.kind === 'ok') input.costPrice = cost.value;
  else if (cost.kind === 'empty') input.costPrice = null;
  else messages.costPrice = cost.message;
  return { input, messages };
}

/** A schema path from the server or zod (`retailPrice.amount`) to the form field showing it. */
export function workFieldFor(path: string): WorkField | undefined {
  const top = path.split('.')[0];
  return workFields.find((field) => field === top);
}

function composeResolver<Parsed extends object>(
  mode: 'create' | 'update',
  currency: string,
  check: Resolver<Record<string, unknown>, unknown, Parsed>,
): Resolver<WorkFormValues, unknown, Parsed> {
  return async (values, context, options) => {
    const { input, messages } = toWorkInput(values, currency, mode);
    const result = await check(input, context, options as never);
    const errors = { ...liftErrors(result.errors, workFieldFor), ...messagesToErrors(messages) };
    if (Object.keys(errors).length > 0) return { values: {}, errors };
    return { values: result.values as Parsed, errors: {} };
  };
}

/** react-hook-form checks the converted values with the shared create schema. */
export function workCreateResolver(currency: string) {
  return composeResolver<WorkCreateParsed>(
    'create',
    currency,
    zodResolver(workCreateSchema) as unknown as Resolver<
      Record<string, unknown>,
      unknown,
      WorkCreateParsed
    >,
  );
}

export function workUpdateResolver(currency: string) {
  return composeResolver<WorkUpdateParsed>(
    'update',
    currency,
    zodResolver(workUpdateSchema) as unknown as Resolver<
      Record<string, unknown>,
      unknown,
      WorkUpdateParsed
    >,
  );
}
