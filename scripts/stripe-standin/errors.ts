/**
 * Stripe's error body: `{ error: { type, code, message, param } }` with 400 (bad request), 401 (bad key),
 * 402 (card declined), 404 (no such object). The SDK maps these to StripeInvalidRequestError,
 * StripeAuthenticationError and StripeCardError.
 */
type StripeErrorType = "invalid_request_error" | "card_error" | "api_error" | "idempotency_error";

export class StandinApiError extends Error {
  constructor(
    readonly status: number,
    readonly type: StripeErrorType,
    message: string,
    readonly code?: string,
    readonly param?: string,
    readonly extra: Record<string, string> = {},
  ) {
    super(message);
  }

  body(): { error: Record<string, string> } {
    const error: Record<string, string> = { type: this.type, message: this.message };
    if (this.code) error.code = this.code;
    if (this.param) error.param = this.param;
    return { error: { ...error, ...this.extra } };
  }
}

export const missingParam = (param: string) =>
  new StandinApiError(400, "invalid_request_error", `Missing required param: ${param}.`, "parameter_missing", param);

export const invalidParam = (param: string, message: string) => new StandinApiError(400, "invalid_request_error", message, "parameter_invalid", param);

export const noSuch = (kind: string, id: string, param = "id") =>
  new StandinApiError(404, "invalid_request_error", `No such ${kind}: '${id}'`, "resource_missing", param);

export const unknownRoute = (method: string, path: string) =>
  new StandinApiError(404, "invalid_request_error", `Unrecognized request URL (${method}: ${path}).`);

export const cardDeclined = (declineCode: string, message: string) =>
  new StandinApiError(402, "card_error", message, "card_declined", undefined, { decline_code: declineCode });
