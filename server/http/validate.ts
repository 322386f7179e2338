import { type RequestHandler, type Response } from 'express';
import { type z } from 'zod';

type Schemas = {
  body?: z.ZodType;
  query?: z.ZodType;
  params?: z.ZodType;
};

type Parsed<S extends Schemas> = {
  [K in keyof S]: S[K] extends z.ZodType ? z.output<S[K]> : never;
};

type Validator<S extends Schemas> = RequestHandler & {
  /** The parsed request, typed by the schemas; call it only after the middleware ran. */
  input(res: Response): Parsed<S>;
};

const key = 'validatedInput';

/**
 * Parses body, query and params with the shared schemas. A ZodError goes to the error handler,
 * which answers 400 with the field issues; handlers read `input(res)`, never raw `req.body`.
 */
export function validate<S extends Schemas>(schemas: S): Validator<S> {
  const middleware: RequestHandler = (req, res, next) => {
    const parsed: Record<string, unknown> = {};
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (schema) parsed[part] = schema.parse(req[part] ?? {});
    }
    res.locals[key] = parsed;
    next();
  };
  return Object.assign(middleware, {
    input: (res: Response) => res.locals[key] as Parsed<S>,
  });
}
