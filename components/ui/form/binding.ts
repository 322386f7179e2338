import {
  type FieldError,
  type FieldErrors,
  type FieldValues,
  type Resolver,
} from 'react-hook-form';
import { type z } from 'zod';

import { type Parsed } from '../decimal-text';
import { type Codec } from './codecs';

/** One form field: how its value is read, where it goes in the body, and what blank means. */
export type FieldBinding<FieldValue, Values extends FieldValues = FieldValues> = {
  /** Reads the field; the whole form is there for a field that depends on another (a currency). */
  read: Codec<FieldValue, unknown> | ((value: FieldValue, values: Values) => Parsed<unknown>);
  /** Its place in the request body ("defaultTerms.commissionRateBp"); the field's name if left out. */
  path?: string;
  /**
   * What a blank field sends: `null` (cleared; the default), nothing at all (`omit`, so the
   * server keeps or makes the value), or a message when the field must be filled.
   */
  blank?: 'null' | 'omit' | { required: string };
  /** Sent only when this says so, given the whole form (an agreed value only when it applies). */
  when?: (values: Values) => boolean;
};

export type FieldBindings<Values extends FieldValues> = {
  [K in keyof Values & string]: FieldBinding<Values[K], Values>;
};

export type FormBinding<Values extends FieldValues, Body> = {
  resolver: Resolver<Values, unknown, Body>;
  /** The form field that shows a schema path from zod or the server, if one does. */
  fieldFor: (path: string) => (keyof Values & string) | undefined;
  /** The request body the values make, and messages for text that could not be read. */
  toBody: (values: Values) => { body: Record<string, unknown>; messages: Record<string, string> };
};

function setPath(target: Record<string, unknown>, path: string, value: unknown): void {
  const keys = path.split('.');
  let node = target;
  for (const key of keys.slice(0, -1)) {
    const next = node[key];
    node = (typeof next === 'object' && next !== null ? next : (node[key] = {})) as Record<
      string,
      unknown
    >;
  }
  node[keys.at(-1)!] = value;
}

/**
 * Binds a form's fields to a shared request schema: the form holds text as typed, the binding
 * reads it into the body, the shared zod schema judges it, and every message (the schema's, or
 * the server's later) lands on the field that shows that part of the body. A form is then a list
 * of fields, not new wiring.
 */
export function bindForm<Values extends FieldValues, Body>(
  schema: z.ZodType<Body>,
  fields: FieldBindings<Values>,
): FormBinding<Values, Body> {
  const entries = (
    Object.entries(fields) as [keyof Values & string, FieldBinding<unknown, Values>][]
  ).map(([name, binding]) => ({ name, binding, path: binding.path ?? name }));

  const fieldFor = (path: string) => {
    const exact = entries.find((e) => e.path === path);
    if (exact) return exact.name;
    // A deeper issue (`retailPrice.amount`) belongs to the field holding its parent; a
    // shallower one (`paymentTerms`) to the first field inside it.
    const holding = entries
      .filter((e) => path.startsWith(`${e.path}.`))
      .sort((a, b) => b.path.length - a.path.length)[0];
    return holding?.name ?? entries.find((e) => e.path.startsWith(`${path}.`))?.name;
  };

  const toBody = (values: Values) => {
    const body: Record<string, unknown> = {};
    const messages: Record<string, string> = {};
    for (const { name, binding, path } of entries) {
      if (binding.when && !binding.when(values)) continue;
      const read = binding.read(values[name], values);
      if (read.kind === 'ok') setPath(body, path, read.value);
      else if (read.kind === 'invalid') messages[name] = read.message;
      else if (typeof binding.blank === 'object') messages[name] = binding.blank.required;
      else if (binding.blank !== 'omit') setPath(body, path, null);
    }
    return { body, messages };
  };

  const resolver: Resolver<Values, unknown, Body> = async (values) => {
    const { body, messages } = toBody(values);
    const result = schema.safeParse(body);
    const errors: Record<string, FieldError> = {};
    for (const [name, message] of Object.entries(messages))
      errors[name] = { type: 'parse', message };
    if (!result.success) {
      for (const issue of result.error.issues) {
        const name = fieldFor(issue.path.map(String).join('.')) ?? 'root';
        errors[name] ??= { type: issue.code, message: issue.message };
      }
    }
    if (Object.keys(errors).length > 0 || !result.success) {
      return { values: {}, errors: errors as FieldErrors<Values> };
    }
    return { values: result.data, errors: {} };
  };

  return { resolver, fieldFor, toBody };
}
