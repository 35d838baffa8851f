// One error shape for every API answer: { error: { code, message, fields? } }.
export type ErrorCode =
  | 'bad_request'
  | 'validation_failed'
  | 'unauthorized'
  | 'forbidden'
  | 'forbidden_origin'
  | 'not_found'
  | 'conflict'
  | 'unprocessable'
  | 'payload_too_large'
  | 'limit_reached'
  | 'budget_too_large'
  | 'busy'
  | 'rate_limited'
  | 'invite_invalid'
  | 'invite_expired'
  | 'invite_used'
  | 'invite_revoked'
  | 'invite_wrong_account'
  | 'mail_failed'
  | 'internal';

export type ErrorBody = {
  error: { code: ErrorCode; message: string; fields?: Record<string, string[]> };
};

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string[]>,
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
    this.name = 'HttpError';
  }

  toBody(): ErrorBody & Record<string, unknown> {
    const error = this.fields
      ? { code: this.code, message: this.message, fields: this.fields }
      : { code: this.code, message: this.message };
    return { error, ...this.extra };
  }
}

export const notFound = (what = 'That was not found.') => new HttpError(404, 'not_found', what);
export const unauthorized = () => new HttpError(401, 'unauthorized', 'Please sign in to continue.');

/** A stale version: the client gets the record as it now stands, to show and choose from. */
export const conflict = (current: unknown) =>
  new HttpError(409, 'conflict', 'Changed by someone else since you opened it.', undefined, { current });

export const unprocessable = (field: string, message: string) =>
  new HttpError(422, 'unprocessable', message, { [field]: [message] });

/** One more would pass a documented maximum (LIMITS): 400, naming the field and the limit. */
export const limitReached = (field: string, message: string) =>
  new HttpError(400, 'limit_reached', message, { [field]: [message] });
