import { moneyText, numberText } from '@/components/ui/decimal-text';
import { bindForm, type FieldBindings, type FormBinding } from '@/components/ui/form/binding';
import {
  choiceCodec,
  lengthCodec,
  moneyCodec,
  numberCodec,
  textCodec,
  weightCodec,
} from '@/components/ui/form/codecs';
import {
  type FoodUse,
  type Work,
  type WorkCreateParsed,
  workCreateSchema,
  type WorkUpdateParsed,
  workUpdateSchema,
} from '@/shared/schemas/work';

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

/**
 * How each field reaches the request body. On create a blank stock number is left out so the
 * server makes the next one; on edit it must stay filled.
 */
export function workBinding(
  mode: 'create',
  currency: string,
): FormBinding<WorkFormValues, WorkCreateParsed>;
export function workBinding(
  mode: 'update',
  currency: string,
): FormBinding<WorkFormValues, WorkUpdateParsed>;
export function workBinding(mode: 'create' | 'update', currency: string) {
  const money = moneyCodec(currency);
  const fields: FieldBindings<WorkFormValues> = {
    stockNumber: {
      read: textCodec,
      blank: mode === 'create' ? 'omit' : { required: 'Enter a stock number.' },
    },
    title: { read: textCodec, blank: { required: 'Enter a title.' } },
    year: { read: numberCodec },
    series: { read: textCodec },
    category: { read: textCodec },
    clayBody: { read: textCodec },
    glaze: { read: textCodec },
    firingTempC: { read: numberCodec },
    atmosphere: { read: textCodec },
    kiln: { read: textCodec },
    heightMm: { read: lengthCodec },
    widthMm: { read: lengthCodec },
    depthMm: { read: lengthCodec },
    weightG: { read: weightCodec },
    retailPrice: { read: money, blank: { required: 'Enter the retail price.' } },
    costPrice: { read: money },
    foodUse: { read: choiceCodec },
    careNotes: { read: textCodec },
    notes: { read: textCodec },
  };
  return mode === 'create'
    ? bindForm<WorkFormValues, WorkCreateParsed>(workCreateSchema, fields)
    : bindForm<WorkFormValues, WorkUpdateParsed>(workUpdateSchema, fields);
}
