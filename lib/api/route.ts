import "server-only";

import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";

import { can, type Permission } from "@/lib/auth/permissions";
import { sessionTokenFromCookies, userFromSessionToken, type SessionUser } from "@/lib/auth/session";
import { AppError, zodFieldErrors } from "@/lib/errors";

import { checkSameOrigin } from "./origin";

type Schema = z.ZodType;
type Infer<S> = S extends z.ZodType ? z.infer<S> : undefined;

type Spec<P, B, Q> = {
  /** "public" routes skip the session; everything else fails closed. */
  permission: Permission | "public";
  params?: P;
  body?: B;
  query?: Q;
  /** Answer 404 instead of 403 to a signed-in user of the wrong role (admin routes). */
  hide?: boolean;
};

export type RouteContext<P, B, Q, Pub> = {
  req: NextRequest;
  user: Pub extends "public" ? SessionUser | null : SessionUser;
  params: Infer<P>;
  body: Infer<B>;
  query: Infer<Q>;
};

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string | string[]>> }) => Promise<Response>;

export function errorResponse(error: AppError): NextResponse {
  return NextResponse.json(
    { error: { code: error.code, message: error.message, ...(error.fieldErrors ? { fieldErrors: error.fieldErrors } : {}) } },
    { status: error.status, headers: error.headers },
  );
}

export function toErrorResponse(error: unknown): NextResponse {
  if (error instanceof AppError) return errorResponse(error);
  console.error("[api] unexpected error", error);
  return errorResponse(new AppError("internal", "Something went wrong on our side. Please try again."));
}

function parse<S extends Schema>(schema: S, value: unknown, what: string): z.infer<S> {
  const result = schema.safeParse(value);
  if (!result.success) throw new AppError("bad_request", `The ${what} has problems: fix the fields listed.`, zodFieldErrors(result.error.issues));
  return result.data;
}

async function readJson(req: NextRequest): Promise<unknown> {
  const text = await req.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    throw new AppError("bad_request", "The request body is not valid JSON.");
  }
}

/** Every route handler goes through here: session, permission, origin, input parsing, error shape. */
export function route<P extends Schema | undefined = undefined, B extends Schema | undefined = undefined, Q extends Schema | undefined = undefined, Pub extends Permission | "public" = Permission>(
  spec: Spec<P, B, Q> & { permission: Pub },
  fn: (ctx: RouteContext<P, B, Q, Pub>) => Promise<unknown>,
): Handler {
  return async (req, context) => {
    try {
      if (req.method !== "GET" && req.method !== "HEAD") checkSameOrigin(req);
      const user = await userFromSessionToken(sessionTokenFromCookies((n) => req.cookies.get(n)?.value));
      if (spec.permission !== "public") {
        if (!user) throw new AppError(spec.hide ? "not_found" : "unauthorized", spec.hide ? "Not found." : "Sign in to continue.");
        if (!can(user.role, spec.permission)) {
          throw spec.hide ? new AppError("not_found", "Not found.") : new AppError("forbidden", "Your account cannot do that.");
        }
      }
      const rawParams = context?.params ? await context.params : {};
      const params = spec.params ? parse(spec.params, rawParams, "address") : undefined;
      const query = spec.query ? parse(spec.query, Object.fromEntries(req.nextUrl.searchParams), "query") : undefined;
      const body = spec.body ? parse(spec.body, await readJson(req), "request") : undefined;
      const result = await fn({ req, user, params, body, query } as RouteContext<P, B, Q, Pub>);
      if (result instanceof Response) return result;
      return NextResponse.json(result ?? { ok: true });
    } catch (error) {
      return toErrorResponse(error);
    }
  };
}

export const json = (data: unknown, status = 200) => NextResponse.json(data, { status });
