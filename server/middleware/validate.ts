import type { Request } from 'express';
import type { z } from 'zod';
import { fromZodError } from '../lib/errors';

// Handlers call these instead of reading req.body/query/params directly, so every input is parsed
// by the shared zod schema and an unknown field never reaches a service.
function parseWith<S extends z.ZodType>(schema: S, value: unknown, prefix: string): z.output<S> {
  const result = schema.safeParse(value);
  if (!result.success) throw fromZodError(result.error, prefix);
  return result.data;
}

export const parseBody = <S extends z.ZodType>(req: Request, schema: S) => parseWith(schema, req.body ?? {}, '');
export const parseQuery = <S extends z.ZodType>(req: Request, schema: S) => parseWith(schema, req.query, 'query');
export const parseParams = <S extends z.ZodType>(req: Request, schema: S) => parseWith(schema, req.params, 'params');
