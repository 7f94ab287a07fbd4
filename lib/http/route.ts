import "server-only";
import { NextResponse } from "next/server";
import type { z } from "zod";
import { requireUser } from "@/lib/auth/guard";
import type { Permission } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session";
import { AppError, badInput, toErrorBody } from "./errors";
import { gateParams, gateRequest } from "./input-gate";

type Access = { permission: Permission } | { public: true } | { signedIn: true };

type Ctx<P> = { request: Request; params: P; user: SessionUser | null };

export function jsonError(error: unknown): NextResponse {
  const { status, body } = toErrorBody(error);
  return NextResponse.json(body, { status });
}

/** Parses a JSON body with a zod schema; bad or missing JSON is a 400 with a clear message. */
export async function parseJson<S extends z.ZodType>(request: Request, schema: S): Promise<z.infer<S>> {
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    throw new AppError("bad_request", "The request body must be JSON.");
  }
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw badInput(parsed.error);
  return parsed.data;
}

export function parseQuery<S extends z.ZodType>(request: Request, schema: S): z.infer<S> {
  // A repeated parameter (`?page=1&page=2`) keeps its last value; the gate has checked them all.
  const params = Object.fromEntries(new URL(request.url).searchParams.entries());
  const parsed = schema.safeParse(params);
  if (!parsed.success) throw badInput(parsed.error);
  return parsed.data;
}

/**
 * The one wrapper for route handlers: checks the session and the role on the server,
 * runs the handler, and turns every thrown error into `{ error: { code, message, fields? } }`.
 */
export function route<P = Record<string, string>>(
  access: Access,
  handler: (ctx: Ctx<P>) => Promise<Response | unknown>,
) {
  return async (request: Request, context: { params: Promise<P> }): Promise<Response> => {
    try {
      // Bad text (control characters, broken percent-encoding, prototype keys) never reaches
      // the handler or the database: 400 before the session is even read.
      await gateRequest(request);
      let params: P;
      try {
        params = (await context?.params) ?? ({} as P);
      } catch {
        throw new AppError("bad_request", "The address has a malformed percent-encoding.", { path: "The address has a malformed percent-encoding." });
      }
      gateParams(params);
      let user: SessionUser | null = null;
      if ("permission" in access) user = await requireUser(access.permission);
      else if ("signedIn" in access) user = await requireUser();
      const result = await handler({ request, params, user });
      return result instanceof Response ? result : NextResponse.json(result);
    } catch (error) {
      return jsonError(error);
    }
  };
}

type Handler<C> = (request: Request, context: C) => Promise<Response> | Response;
type Gated<C> = (request: Request, context?: C) => Promise<Response>;

/**
 * The same input gate for a handler that cannot use route() (the auth route, the payment
 * webhook, public media): bad text gets the 400 error shape before the handler runs.
 */
export function gated<C extends { params?: Promise<unknown> }>(handler: Handler<C>): Gated<C> {
  return async (request: Request, context?: C): Promise<Response> => {
    try {
      await gateRequest(request);
      let params: unknown;
      try {
        params = await context?.params;
      } catch {
        throw new AppError("bad_request", "The address has a malformed percent-encoding.", { path: "The address has a malformed percent-encoding." });
      }
      gateParams(params);
    } catch (error) {
      return jsonError(error);
    }
    return handler(request, context as C);
  };
}
