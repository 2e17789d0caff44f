/** An error answered in Stripe's shape: `{ error: { type, code?, message, param?, decline_code? } }`. */
export class StripeApiError extends Error {
  constructor(
    readonly status: number,
    readonly type: 'invalid_request_error' | 'card_error' | 'api_error' | 'idempotency_error',
    message: string,
    readonly extra: { code?: string; param?: string; decline_code?: string } = {},
  ) {
    super(message);
  }

  toJSON(): { error: Record<string, string> } {
    const error: Record<string, string> = { type: this.type, message: this.message };
    if (this.extra.code) error.code = this.extra.code;
    if (this.extra.param) error.param = this.extra.param;
    if (this.extra.decline_code) error.decline_code = this.extra.decline_code;
    return { error };
  }
}

export function invalidParam(message: string, param?: string, code?: string): StripeApiError {
  return new StripeApiError(400, 'invalid_request_error', message, { param, code });
}

export function missingParam(param: string): StripeApiError {
  return invalidParam(`Missing required param: ${param}.`, param, 'parameter_missing');
}

export function noSuch(kind: string, id: string, param = 'id'): StripeApiError {
  return new StripeApiError(404, 'invalid_request_error', `No such ${kind}: '${id}'`, { code: 'resource_missing', param });
}
