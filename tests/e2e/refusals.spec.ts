import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { expect, test, type APIRequestContext } from "@playwright/test";
import { signInAs } from "./support/accounts";

// Bad input against the production server itself, not only against the handlers called directly
// (tests/integration/http/fuzz-routes.test.ts): how the built router decodes a path segment, and
// the auth route with its real request scope, only show here. Every route under app/ is found by
// walking the folders; each gets bad path segments, bad queries and bad bodies, signed out and
// as an administrator. No answer may be a 5xx.

const APP = fileURLToPath(new URL("../../app", import.meta.url));

function findRoutes(dir: string, found: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) findRoutes(full, found);
    else if (name === "route.ts") found.push(path.relative(APP, path.dirname(full)));
  }
  return found.sort();
}

const BAD_SEGMENTS = [
  "%00",
  "a%00b",
  "%E0%A4%A",
  "%ZZ",
  "%",
  "..%2F..%2Fetc%2Fpasswd",
  "%C0%AF",
  "0x10",
  "%0D%0Aset-cookie:x=1",
  "a".repeat(3000),
];

const BAD_QUERIES = [
  "?q=%00&page=0x10&limit=1e3",
  "?zip=%E0%A4%A&band=%ZZ",
  "?__proto__%5Bx%5D=1&constructor=1&prototype=1",
  "?%ZZ=1",
  "?page=-1&sort=%00&dir=%0A",
  `?q=${"x".repeat(5000)}`,
];

// Bodies never carry a usable e-mail and password pair, so the auth route records no sign-in
// attempt (the throttle would otherwise slow the suites after this one).
const BAD_BODIES: Array<{ type: string; data: string }> = [
  {
    type: "application/json",
    data: JSON.stringify({ name: "a\u0000b", email: "a\u0000@example.org", slug: "a\u0000", zip: "\u0000", quantity: "0x10", note: "\u0000" }),
  },
  { type: "application/json", data: '{"__proto__":{"role":"admin"},"constructor":{"prototype":{"x":1}}}' },
  { type: "application/json", data: "{" },
  { type: "application/json", data: "[1,2,3]" },
  { type: "application/json", data: "null" },
  { type: "application/json", data: `${"[".repeat(200)}${"]".repeat(200)}` },
  { type: "application/json", data: JSON.stringify({ lines: "x".repeat(200_000) }) },
  { type: "application/x-www-form-urlencoded", data: "email=%ZZ&password=%00&csrfToken=%E0%A4%A" },
  { type: "text/plain", data: "\u0000\u0001\u0002" },
];

function urlsFor(route: string): string[] {
  const segments = route.split(path.sep).filter((s) => !/^\(.*\)$/.test(s));
  const dynamic = segments.some((s) => s.startsWith("["));
  const base = (value: string) => "/" + segments.map((s) => (s.startsWith("[") ? value : s)).join("/");
  const urls = dynamic ? BAD_SEGMENTS.map(base) : [];
  const plain = base("x");
  for (const query of BAD_QUERIES) urls.push(plain + query);
  if (route.includes("[...nextauth]")) {
    for (const sub of ["session", "csrf", "providers", "signin/credentials", "callback/credentials", "signout"]) {
      urls.push(`/api/auth/${sub}`, `/api/auth/${sub}?callbackUrl=%E0%A4%A&error=%00`);
    }
  }
  return urls;
}

async function sweep(request: APIRequestContext): Promise<{ sent: number; failures: string[] }> {
  const failures: string[] = [];
  let sent = 0;
  const note = (method: string, url: string, status: number) => {
    sent += 1;
    if (status >= 500) failures.push(`${method} ${url.slice(0, 120)} → ${status}`);
  };
  for (const route of findRoutes(APP)) {
    const urls = urlsFor(route);
    for (const url of urls) {
      const res = await request.get(url, { maxRedirects: 0, failOnStatusCode: false });
      note("GET", url, res.status());
    }
    // Bodies go to the route's own address (its dynamic parts filled with a plain value) and to
    // one bad address, by every writing method.
    for (const url of [urls[urls.length - 1]!.split("?")[0]!, urls[0]!]) {
      for (const method of ["POST", "PUT", "PATCH", "DELETE"] as const) {
        for (const body of BAD_BODIES) {
          const res = await request.fetch(url, {
            method,
            headers: { "content-type": body.type, origin: "http://localhost" },
            data: body.data,
            maxRedirects: 0,
            failOnStatusCode: false,
          });
          note(method, url, res.status());
        }
      }
    }
  }
  return { sent, failures };
}

test.describe("bad input on the production server", () => {
  test.setTimeout(600_000);

  test("signed out: no route answers 5xx", async ({ request }) => {
    const { sent, failures } = await sweep(request);
    console.log(`refusals (signed out): ${sent} requests over ${findRoutes(APP).length} route files`);
    expect(failures).toEqual([]);
    expect(sent).toBeGreaterThan(1000);
  });

  test("as an administrator: no route answers 5xx", async ({ page }) => {
    await signInAs(page, "admin");
    const { sent, failures } = await sweep(page.context().request);
    console.log(`refusals (admin): ${sent} requests`);
    expect(failures).toEqual([]);
    // Still signed in: nothing above ended the session or changed the account.
    const session = await page.context().request.get("/api/auth/session");
    expect((await session.json()).user?.role).toBe("admin");
  });
});
