/**
 * Typed errors that route handlers and the data layer throw; `toErrorResponse` maps them to HTTP
 * status codes in one place (400/401/403/404/409/422).
 */
export interface FieldIssue {
  path: string;
  message: string;
}

export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly issues: FieldIssue[] = [],
    readonly details?: unknown,
  ) {
    super(message);
    this.name = "HttpError";
  }
}

export const badRequest = (message: string, issues: FieldIssue[] = []) => new HttpError(400, message, issues);
export const unauthenticated = () => new HttpError(401, "sign in required");
export const forbidden = (message = "your role does not allow this") => new HttpError(403, message);
/** Also used for resources in a workspace the user is not in, so their existence is not confirmed. */
export const notFound = (what = "not found") => new HttpError(404, what);
export const conflict = (message: string, current?: unknown) => new HttpError(409, message, [], current);
export const unprocessable = (message: string, issues: FieldIssue[] = []) => new HttpError(422, message, issues);
export const tooManyRequests = (message: string) => new HttpError(429, message);
