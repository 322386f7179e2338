import { type z } from 'zod';

import { ApiError, errorFromResponse } from './api-errors';

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

type RequestOptions<S extends z.ZodType | undefined> = {
  method?: Method;
  body?: unknown;
  /** Shared schema of the success body; without one the body is not read. */
  schema?: S;
  signal?: AbortSignal;
};

type Result<S> = S extends z.ZodType ? z.output<S> : void;

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text === '') return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/** The one way the client talks to the API: same origin, session cookie, typed errors. */
export async function apiRequest<S extends z.ZodType | undefined = undefined>(
  path: `/api/${string}`,
  { method = 'GET', body, schema, signal }: RequestOptions<S> = {},
): Promise<Result<S>> {
  let response: Response;
  try {
    response = await fetch(path, {
      method,
      credentials: 'same-origin',
      headers:
        body === undefined
          ? { Accept: 'application/json' }
          : { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
      signal,
    });
  } catch (cause) {
    if (cause instanceof Error && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'network', '');
  }

  const json = await readJson(response);
  if (!response.ok) throw errorFromResponse(response.status, json);
  if (schema === undefined) return undefined as Result<S>;

  const parsed = schema.safeParse(json);
  if (!parsed.success) throw new ApiError(response.status, 'unexpected_response', '');
  return parsed.data as Result<S>;
}
