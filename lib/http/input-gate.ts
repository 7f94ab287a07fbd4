import "server-only";
import { AppError } from "./errors";
import { headerProblem, keyProblem, paramsProblem, urlProblem, valueProblem, type InputProblem } from "./input-rules";

// The one gate every request passes before a handler runs (route(), the auth route, the
// webhook): control characters, malformed percent-encoding and prototype keys are refused
// with 400 here, so no handler and no query ever sees them.

/** Bodies larger than this are not read by the gate; the handlers' own limits apply. */
const MAX_GATED_BODY_BYTES = 1024 * 1024;

function refuse(problem: InputProblem): AppError {
  return new AppError("bad_request", problem.message, { [problem.field]: problem.message });
}

/** Throws a 400 AppError when the URL, a header or the body (JSON or a URL-encoded form) is bad. */
export async function gateRequest(request: Request, params?: unknown): Promise<void> {
  let url: URL;
  try {
    url = new URL(request.url);
  } catch {
    throw new AppError("bad_request", "The address is not valid.", { path: "The address is not valid." });
  }
  const problem = urlProblem(url) ?? paramsProblem(params) ?? headersProblem(request.headers) ?? (await bodyProblem(request));
  if (problem) throw refuse(problem);
}

/** The same check for a route parameter object the framework has already decoded. */
export function gateParams(params: unknown): void {
  const problem = paramsProblem(params);
  if (problem) throw refuse(problem);
}

/** The same check for a server action's input (an object or a FormData). */
export function gateValue(value: unknown): void {
  const problem = valueProblem(value, []);
  if (problem) throw refuse(problem);
}

function headersProblem(headers: Headers): InputProblem | null {
  for (const [name, value] of headers.entries()) {
    const problem = headerProblem(name, value);
    if (problem) return problem;
  }
  return null;
}

async function bodyProblem(request: Request): Promise<InputProblem | null> {
  if (request.method === "GET" || request.method === "HEAD" || !request.body) return null;
  const type = (request.headers.get("content-type") ?? "").toLowerCase();
  // Multipart uploads are read once, under their own size limit, by the upload routes, which
  // check their text fields with the same rules.
  if (type.startsWith("multipart/")) return null;
  const length = Number(request.headers.get("content-length") ?? "0");
  if (Number.isFinite(length) && length > MAX_GATED_BODY_BYTES) return null;
  let text: string;
  try {
    text = await request.clone().text();
  } catch {
    return { field: "body", message: "The request body could not be read." };
  }
  if (text.length > MAX_GATED_BODY_BYTES) return null;
  if (type.startsWith("application/x-www-form-urlencoded")) {
    for (const part of text.split("&")) {
      if (part === "") continue;
      try {
        decodeURIComponent(part.replace(/\+/g, " "));
      } catch {
        return { field: "body", message: "The form has a malformed percent-encoding." };
      }
    }
    for (const [key, value] of new URLSearchParams(text).entries()) {
      const problem = keyProblem(key, []) ?? valueProblem(value, [key]);
      if (problem) return problem;
    }
    return null;
  }
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch {
    // Declared JSON but not JSON: refused here, so no handler (next-auth's included) throws on it.
    if (type.includes("json") || text.includes("\u0000")) return { field: "body", message: "The request body must be JSON." };
    return null;
  }
  return valueProblem(parsed, []);
}
