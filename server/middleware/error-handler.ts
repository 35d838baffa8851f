import type { NextFunction, Request, Response } from 'express';
import { ZodError } from 'zod';
import { isFieldRuleIssue } from '@/shared/schemas/limits';
import { HttpError } from '../errors';
import { requestForLog } from '../logger';

type BodyParserError = Error & { type?: string; status?: number };

function fieldsOf(error: ZodError): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.join('.') : '_';
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

/** Turns anything thrown into the stable error body; stack traces stay in the log. */
export function toHttpError(err: unknown): HttpError {
  if (err instanceof HttpError) return err;
  if (err instanceof ZodError) {
    // Shape errors (types, ranges, missing fields) are 400; when every issue comes from a rule
    // between fields (departure after arrival, drives that fit between stops) the request was
    // well-formed but makes no sense: 422. Refinements marked as rules about one field (sizes, repeats) stay 400.
    const semantic = err.issues.every((issue) => issue.code === 'custom' && !isFieldRuleIssue(issue));
    return semantic
      ? new HttpError(422, 'unprocessable', 'Some values do not fit together.', fieldsOf(err))
      : new HttpError(400, 'validation_failed', 'Some fields need attention.', fieldsOf(err));
  }
  const parserError = err as BodyParserError;
  if (parserError?.type === 'entity.parse.failed') {
    return new HttpError(400, 'bad_request', 'The request body is not valid JSON.');
  }
  if (parserError?.type === 'entity.too.large') {
    return new HttpError(413, 'payload_too_large', 'The request body is too large.');
  }
  if (typeof parserError?.status === 'number' && parserError.status >= 400 && parserError.status < 500) {
    return new HttpError(parserError.status, 'bad_request', 'The request could not be read.');
  }
  return new HttpError(500, 'internal', 'Something went wrong on our side. Please try again.');
}

export function errorHandler(err: unknown, req: Request, res: Response, _next: NextFunction) {
  const httpError = toHttpError(err);
  if (httpError.status >= 500) req.log?.error({ err, reqId: req.id, req: requestForLog(req) }, 'request failed');
  if (res.headersSent) return;
  res.status(httpError.status).json(httpError.toBody());
}
