/**
 * The validated wrapper for every route handler: reads the session, refuses cross-origin writes,
 * parses the body / query with the shared zod schema, runs the handler, and maps typed errors to
 * status codes in one place. Authorization (workspace membership and role) is the handler's first
 * call, through lib/authz.ts, because it needs the resource id.
 */
import { NextResponse, type NextRequest } from "next/server";
import { z, ZodError } from "zod";
import { HttpError, badRequest, forbidden, type FieldIssue } from "./errors";
import { getSessionUser } from "@/lib/auth/session";
import type { SessionUser } from "@/lib/auth/session-user";

type Params = Record<string, string>;

export interface HandlerContext<TBody, TQuery> {
  req: NextRequest;
  params: Params;
  user: SessionUser | null;
  body: TBody;
  query: TQuery;
}

interface HandlerConfig<TBodySchema extends z.ZodType | undefined, TQuerySchema extends z.ZodType | undefined> {
  body?: TBodySchema;
  query?: TQuerySchema;
}

type Infer<T> = T extends z.ZodType ? z.infer<T> : undefined;

const WRITE_METHODS = new Set(["POST", "PUT", "PATCH", "DELETE"]);

export function zodIssues(error: ZodError): FieldIssue[] {
  return error.issues.map((issue) => ({ path: issue.path.map(String).join("."), message: issue.message }));
}

/** Same-origin writes only: a browser always sends Origin on cross-site POSTs. */
function checkOrigin(req: NextRequest): void {
  if (!WRITE_METHODS.has(req.method)) return;
  const origin = req.headers.get("origin");
  if (!origin) return; // non-browser clients (tests, CLI scripts) carry no Origin; cookies are SameSite=Lax
  const host = req.headers.get("x-forwarded-host") ?? req.headers.get("host");
  let originHost: string;
  try {
    originHost = new URL(origin).host;
  } catch {
    throw forbidden("cross-origin request refused");
  }
  if (originHost !== host) throw forbidden("cross-origin request refused");
}

export function errorResponse(error: unknown): NextResponse {
  if (error instanceof HttpError) {
    return NextResponse.json(
      { error: error.message, issues: error.issues, ...(error.details !== undefined ? { current: error.details } : {}) },
      { status: error.status },
    );
  }
  if (error instanceof ZodError) {
    return NextResponse.json({ error: "invalid input", issues: zodIssues(error) }, { status: 400 });
  }
  if (error instanceof RangeError || error instanceof TypeError) {
    return NextResponse.json({ error: error.message, issues: [] }, { status: 422 });
  }
  console.error("unhandled route error", error instanceof Error ? error.message : "unknown");
  return NextResponse.json({ error: "internal error", issues: [] }, { status: 500 });
}

export function handler<TBodySchema extends z.ZodType | undefined = undefined, TQuerySchema extends z.ZodType | undefined = undefined>(
  config: HandlerConfig<TBodySchema, TQuerySchema>,
  fn: (ctx: HandlerContext<Infer<TBodySchema>, Infer<TQuerySchema>>) => Promise<unknown>,
) {
  return async (req: NextRequest, context: { params: Promise<Params> }): Promise<Response> => {
    try {
      checkOrigin(req);
      const params = (await context.params) ?? {};
      const user = await getSessionUser(req);
      let body: unknown = undefined;
      if (config.body) {
        let raw: unknown;
        try {
          raw = await req.json();
        } catch {
          throw badRequest("the request body is not valid JSON", [{ path: "", message: "expected a JSON body" }]);
        }
        body = config.body.parse(raw);
      }
      let query: unknown = undefined;
      if (config.query) query = config.query.parse(Object.fromEntries(req.nextUrl.searchParams));
      const result = await fn({ req, params, user, body: body as Infer<TBodySchema>, query: query as Infer<TQuerySchema> });
      if (result instanceof Response) return result;
      return NextResponse.json(result ?? { ok: true });
    } catch (error) {
      return errorResponse(error);
    }
  };
}
