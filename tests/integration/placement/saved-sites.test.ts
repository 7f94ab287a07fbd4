// Saved sites: who may open and delete them (the owner by account, a guest by token), and that
// the saved result is the server's own check, not whatever the client sent.
import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { getDb } from "@/db/client";
import { orders, sites, users, type OrderRow } from "@/db/schema";
import { GET as sitesList, POST as sitesPost } from "@/app/api/sites/route";
import { DELETE as siteDelete, GET as siteGet } from "@/app/api/sites/[id]/route";
import type { SessionUser } from "@/lib/auth/session";
import { resolveGuideContext } from "@/lib/mail/guide-context";
import { buildInstallGuide } from "@/lib/mail/install-guide-content";
import type { OrgFooter } from "@/lib/mail/message-types";
import { resetDb } from "../../support/db";
import { jsonRequest, noParams, siteInput } from "./helpers";

const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => session.user }));

const TOKEN_HEADER = "x-guest-site-token";
let alice: SessionUser;
let bruno: SessionUser;

async function addUser(name: string, email: string): Promise<SessionUser> {
  const db = await getDb();
  const [row] = await db
    .insert(users)
    .values({ name, email, passwordHash: "not-used" })
    .returning();
  return { id: row!.id, name, email, role: "customer" };
}

// A typed July high keeps these tests off the station data.
const input = (partial: Record<string, unknown> = {}) => siteInput({ julyHighF: 91, ...partial });
const save = (body: unknown) =>
  sitesPost(jsonRequest("http://localhost/api/sites", body), noParams);
const at = (id: string) => ({ params: Promise.resolve({ id }) });
const open = (id: string, token?: string) =>
  siteGet(
    new Request(`http://localhost/api/sites/${id}`, {
      headers: token ? { [TOKEN_HEADER]: token } : {},
    }),
    at(id),
  );
const remove = (id: string, token?: string) =>
  siteDelete(
    new Request(`http://localhost/api/sites/${id}`, {
      method: "DELETE",
      headers: token ? { [TOKEN_HEADER]: token } : {},
    }),
    at(id),
  );

beforeEach(async () => {
  await resetDb();
  alice = await addUser("Wren Talbot", "wren@example.org");
  bruno = await addUser("Osric Vale", "osric@example.org");
  session.user = null;
});

describe("a guest's saved site", () => {
  it("is saved with a fresh token, opened only with it, and deleted only with it", async () => {
    const res = await save({ name: "Pole by the pond", input: input({ mount: "tree" }) });
    expect(res.status).toBe(200);
    const saved = await res.json();
    expect(saved).toMatchObject({
      name: "Pole by the pond",
      label: "poor",
      bandId: "warm",
      julyHighF: 91,
      zip: "80302",
    });
    expect(saved.guestToken).toMatch(/^[A-Za-z0-9_-]{32}$/);

    const second = await (await save({ name: "Barn wall", input: input() })).json();
    expect(second.guestToken).not.toBe(saved.guestToken);

    expect((await open(saved.id)).status).toBe(404);
    expect((await open(saved.id, second.guestToken)).status).toBe(404);
    expect((await open(saved.id, `${saved.guestToken.slice(0, -1)}A`)).status).toBe(404);
    const opened = await open(saved.id, saved.guestToken);
    expect(opened.status).toBe(200);
    const body = await opened.json();
    expect(body.input).toMatchObject({ mount: "tree", zip: "80302" });
    expect(body.result.rules).toHaveLength(10);

    // A signed-in stranger gets nothing either.
    session.user = bruno;
    expect((await open(saved.id)).status).toBe(404);
    expect((await remove(saved.id)).status).toBe(404);
    session.user = null;

    expect((await remove(saved.id, second.guestToken)).status).toBe(404);
    expect((await remove(saved.id, saved.guestToken)).status).toBe(200);
    expect((await open(saved.id, saved.guestToken)).status).toBe(404);
  });

  it("keeps the server's own result, whatever the client claims", async () => {
    const res = await save({
      name: "Shed",
      input: input({ brightLight: true }),
      result: { label: "good" },
      label: "good",
    });
    const saved = await res.json();
    expect(saved.label).toBe("poor");
    const db = await getDb();
    const [row] = await db.select().from(sites).where(eq(sites.id, saved.id));
    expect(row).toMatchObject({ label: "poor", userId: null, guestToken: saved.guestToken });
  });

  it("refuses a bad name or a bad site with 400 and the field, saving nothing", async () => {
    const blank = await save({ name: "  ", input: input() });
    expect(blank.status).toBe(400);
    expect((await blank.json()).error.fields.name).toMatch(/Give the site a name/);
    const badLat = await save({ name: "Roof", input: input({ zip: undefined, lat: -91, lon: 0 }) });
    expect(badLat.status).toBe(400);
    expect((await badLat.json()).error.fields["input.lat"]).toMatch(/between -90 and 90/);
    const db = await getDb();
    expect(await db.select().from(sites)).toEqual([]);
  });
});

describe("a saved site's skyline", () => {
  const east = [0, 0, 8, 22, 30, 22, 8, 0, 0, 0, 0, 0, 0, 0, 0, 0];

  it("is kept in its own column, answered by the routes and carried into the install guide", async () => {
    const saved = await (
      await save({ name: "Orchard pole", input: input({ skyline: east }) })
    ).json();
    expect(saved.skyline).toEqual(east);
    const db = await getDb();
    const [row] = await db.select().from(sites).where(eq(sites.id, saved.id));
    expect(row?.skyline).toEqual(east);

    const body = await (await open(saved.id, saved.guestToken)).json();
    expect(body.skyline).toEqual(east);
    expect(body.input.skyline).toEqual(east);
    expect(body.result.sun.skyline.parts[0]).toMatch(
      /^The trees or buildings to the east take about .* of morning sun a day\.$/,
    );

    // The install guide reads the saved result and says the same in its site section.
    const context = await resolveGuideContext({
      order: {} as OrderRow,
      site: row!,
      org: {} as OrgFooter,
    });
    const guide = buildInstallGuide({ houses: [], ...context });
    expect(guide.site?.skyline).toMatch(/to the east take about .* of morning sun a day/);
  });

  it("a site with no skyline keeps none, and its guide says an open sky was assumed", async () => {
    const saved = await (await save({ name: "Meadow pole", input: input() })).json();
    expect(saved.skyline).toBeNull();
    const db = await getDb();
    const [row] = await db.select().from(sites).where(eq(sites.id, saved.id));
    expect(row?.skyline).toBeNull();
    const context = await resolveGuideContext({
      order: {} as OrderRow,
      site: row!,
      org: {} as OrgFooter,
    });
    expect(buildInstallGuide({ houses: [], ...context }).site?.skyline).toMatch(
      /^An open sky was assumed/,
    );
  });

  it("refuses a skyline that is not 16 angles from 0 to 90 with 400 and the field, saving nothing", async () => {
    const res = await save({ name: "Roof", input: input({ skyline: [...east, 0] }) });
    expect(res.status).toBe(400);
    expect((await res.json()).error.fields["input.skyline"]).toMatch(/exactly 16 angles/);
    const db = await getDb();
    expect(await db.select().from(sites)).toEqual([]);
    // The database refuses a wrong-length profile too.
    await expect(
      db
        .insert(sites)
        .values({
          name: "x",
          input: {},
          result: {},
          label: "good",
          bandId: "cool",
          skyline: [1, 2],
        }),
    ).rejects.toThrow();
  });
});

describe("a signed-in buyer's saved site", () => {
  it("belongs to the account: no token, open and delete by the owner only", async () => {
    session.user = alice;
    const saved = await (await save({ name: "South gable", input: input() })).json();
    expect(saved.guestToken).toBeUndefined();
    expect((await open(saved.id)).status).toBe(200);

    session.user = bruno;
    expect((await open(saved.id)).status).toBe(404);
    expect((await remove(saved.id)).status).toBe(404);
    expect(
      (await (await sitesList(new Request("http://localhost/api/sites"), noParams)).json()).items,
    ).toEqual([]);

    session.user = null;
    expect((await open(saved.id)).status).toBe(404);

    session.user = alice;
    const list = await (
      await sitesList(new Request("http://localhost/api/sites"), noParams)
    ).json();
    expect(list.items).toMatchObject([
      { id: saved.id, name: "South gable", label: saved.label, orderCount: 0 },
    ]);
    expect((await remove(saved.id)).status).toBe(200);
    expect((await open(saved.id)).status).toBe(404);
  });

  it("lists only when signed in", async () => {
    const res = await sitesList(new Request("http://localhost/api/sites"), noParams);
    expect(res.status).toBe(401);
  });

  it("keeps a site that went with an order", async () => {
    session.user = alice;
    const saved = await (await save({ name: "Garage", input: input() })).json();
    const db = await getDb();
    await db.insert(orders).values({
      userId: alice.id,
      email: alice.email,
      accessToken: "test-access-token",
      name: alice.name,
      method: "pickup",
      siteId: saved.id,
      subtotalCents: 0,
      shippingCents: 0,
      taxCents: 0,
      giftCents: 0,
      totalCents: 0,
    });
    const res = await remove(saved.id);
    expect(res.status).toBe(409);
    expect((await res.json()).error.message).toMatch(/install guide/);
    expect((await open(saved.id)).status).toBe(200);
  });

  it("treats an id that is not a UUID as not found", async () => {
    session.user = alice;
    expect((await open("not-a-uuid")).status).toBe(404);
    expect((await remove("1; drop table sites")).status).toBe(404);
  });
});
