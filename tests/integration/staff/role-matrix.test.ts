import { count } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";

vi.mock("@/lib/auth/session", () => ({ getSessionUser: vi.fn(async () => null) }));

import * as modelsRoute from "@/app/api/staff/models/route";
import * as photosRoute from "@/app/api/staff/models/[slug]/photos/route";
import * as ledgerRoute from "@/app/api/staff/models/[slug]/stock-movements/route";
import * as staffActions from "@/lib/staff/actions";
import { getDb } from "@/db/client";
import { houseModels, inspections, modelPhotos, stockMovements } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { getSessionUser } from "@/lib/auth/session";
import type { SessionUser } from "@/lib/auth/session";
import { resetDb } from "../../support/db";
import {
  makePhoto,
  modelBySlug,
  params,
  sessionUserFor,
  startPhotoStore,
  uploadRequest,
  type Role,
} from "./helpers";

// Every staff route and action: signed out → 401, customer and fulfillment → 403, and nothing
// changes; staff and admin get through.

const session = vi.mocked(getSessionUser);
let users: Record<Role, SessionUser>;
let modelId: string;
let photoJpeg: Uint8Array;
let store: Awaited<ReturnType<typeof startPhotoStore>>;

beforeAll(async () => {
  photoJpeg = await makePhoto({ width: 400, height: 300, format: "jpeg" });
  store = await startPhotoStore();
});
afterAll(async () => {
  await store?.close();
});

beforeEach(async () => {
  const db = await resetDb();
  await seedDemo(db);
  users = {
    customer: await sessionUserFor(db, "customer"),
    staff: await sessionUserFor(db, "staff"),
    fulfillment: await sessionUserFor(db, "fulfillment"),
    admin: await sessionUserFor(db, "admin"),
  };
  modelId = (await modelBySlug(db, "hollow-four")).id;
});

const PHOTO_ID = "0f8fad5b-d9cb-469f-a165-70867728950e";
const slug = params({ slug: "hollow-four" });

type Call = { name: string; run: () => Promise<{ status: number; code?: string }> };

async function fromResponse(res: Response) {
  const body = (await res.json()) as { error?: { code: string } };
  return { status: res.status, code: body.error?.code };
}

function fromAction(result: { ok: true } | { ok: false; error: { code: string } }) {
  const STATUS: Record<string, number> = { unauthenticated: 401, forbidden: 403 };
  return result.ok
    ? { status: 200 }
    : { status: STATUS[result.error.code] ?? 400, code: result.error.code };
}

const spec = {
  chamberCount: 4,
  chamberGapIn: 0.75,
  chamberHeightIn: 24,
  chamberWidthIn: 16,
  landingAreaIn: 5,
  interiorSurface: "plastic-mesh",
  interiorFinish: "bare",
  seamsSealed: true,
  wood: "cedar",
  outerHeightIn: 30,
  outerWidthIn: 20,
  openBottom: true,
  exteriorShade: "dark",
  vented: true,
};
const modelInput = () => ({
  name: "Matrix Test House",
  tagline: "",
  description: "",
  priceCents: 9900,
  builderName: "Hollow Creek Joinery",
  mounts: ["pole"],
  backToBackKit: false,
  carton: { lengthIn: 26, widthIn: 16, heightIn: 6, weightLb: 9 },
  lowStockThreshold: 2,
  spec,
});

const CALLS: Call[] = [
  {
    name: "GET /api/staff/models",
    run: async () =>
      fromResponse(
        await modelsRoute.GET(new Request("http://localhost/api/staff/models"), params({})),
      ),
  },
  {
    name: "GET /api/staff/models/[slug]/photos",
    run: async () => fromResponse(await photosRoute.GET(new Request("http://localhost/x"), slug)),
  },
  {
    name: "POST /api/staff/models/[slug]/photos",
    run: async () =>
      fromResponse(
        await photosRoute.POST(
          uploadRequest({
            slug: "hollow-four",
            bytes: photoJpeg,
            fileName: "a.jpg",
            type: "image/jpeg",
          }),
          slug,
        ),
      ),
  },
  {
    name: "GET /api/staff/models/[slug]/stock-movements",
    run: async () => fromResponse(await ledgerRoute.GET(new Request("http://localhost/x"), slug)),
  },
  {
    name: "createModelAction",
    run: async () => fromAction(await staffActions.createModelAction(modelInput())),
  },
  {
    name: "updateModelAction",
    run: async () =>
      fromAction(await staffActions.updateModelAction({ id: modelId, ...modelInput() })),
  },
  {
    name: "publishModelAction",
    run: async () => fromAction(await staffActions.publishModelAction({ id: modelId })),
  },
  {
    name: "retireModelAction",
    run: async () => fromAction(await staffActions.retireModelAction({ id: modelId })),
  },
  {
    name: "returnModelToDraftsAction",
    run: async () => fromAction(await staffActions.returnModelToDraftsAction({ id: modelId })),
  },
  {
    name: "removePhotoAction",
    run: async () => fromAction(await staffActions.removePhotoAction({ id: PHOTO_ID })),
  },
  {
    name: "reorderPhotosAction",
    run: async () =>
      fromAction(await staffActions.reorderPhotosAction({ modelId, photoIds: [PHOTO_ID] })),
  },
  {
    name: "updatePhotoAltAction",
    run: async () =>
      fromAction(
        await staffActions.updatePhotoAltAction({ id: PHOTO_ID, altText: "A house on a pole" }),
      ),
  },
  {
    name: "recordInspectionAction",
    run: async () =>
      fromAction(
        await staffActions.recordInspectionAction({
          modelId,
          measured: {
            chamberGapIn: 0.75,
            chamberHeightIn: 24,
            chamberWidthIn: 16,
            landingAreaIn: 5,
            roughening: "grooved",
            seamsSealed: true,
          },
          inspector: "Tobias Marlow",
          inspectedOn: "2026-01-05",
          notes: "",
        }),
      ),
  },
  {
    name: "receiveStockAction",
    run: async () =>
      fromAction(
        await staffActions.receiveStockAction({
          modelId,
          count: 2,
          batch: "b1",
          builderName: "Hollow Creek Joinery",
          note: "",
        }),
      ),
  },
  {
    name: "adjustStockAction",
    run: async () =>
      fromAction(
        await staffActions.adjustStockAction({ modelId, reason: "damaged", change: -1, note: "" }),
      ),
  },
];

async function snapshot() {
  const db = await getDb();
  const n = async (
    table: typeof houseModels | typeof inspections | typeof modelPhotos | typeof stockMovements,
  ) => (await db.select({ n: count() }).from(table))[0]?.n;
  const model = await modelBySlug(db, "hollow-four");
  return {
    models: await n(houseModels),
    inspections: await n(inspections),
    photos: await n(modelPhotos),
    movements: await n(stockMovements),
    model,
  };
}

describe("the staff role matrix", () => {
  it("answers 401 to a signed-out visitor and changes nothing", async () => {
    session.mockResolvedValue(null);
    const before = await snapshot();
    for (const call of CALLS)
      expect(await call.run(), call.name).toEqual({ status: 401, code: "unauthenticated" });
    expect(await snapshot()).toEqual(before);
  });

  for (const role of ["customer", "fulfillment"] as const) {
    it(`answers 403 to ${role} and changes nothing`, async () => {
      session.mockResolvedValue(users[role]);
      const before = await snapshot();
      for (const call of CALLS)
        expect(await call.run(), call.name).toEqual({ status: 403, code: "forbidden" });
      expect(await snapshot()).toEqual(before);
      expect(await store.listKeys()).toEqual([]);
    });
  }

  for (const role of ["staff", "admin"] as const) {
    it(`lets ${role} through every route and action`, async () => {
      session.mockResolvedValue(users[role]);
      const statuses: Record<string, number> = {};
      for (const call of CALLS) statuses[call.name] = (await call.run()).status;
      // Past the role check every time: success, or a domain answer (the made-up photo id is 404).
      for (const [name, status] of Object.entries(statuses))
        expect([401, 403], `${name} → ${status}`).not.toContain(status);
      expect(statuses["POST /api/staff/models/[slug]/photos"]).toBe(201);
      expect(statuses["GET /api/staff/models"]).toBe(200);
      expect(statuses.createModelAction).toBe(200);
    });
  }

  it("answers bad input with 400 and a clear message, changing nothing", async () => {
    session.mockResolvedValue(users.staff);
    const before = await snapshot();
    const badQuery = await modelsRoute.GET(
      new Request("http://localhost/api/staff/models?pageSize=7"),
      params({}),
    );
    expect(badQuery.status).toBe(400);
    expect(((await badQuery.json()) as { error: { message: string } }).error.message).toBe(
      "pageSize: Show 10, 25 or 50 models a page.",
    );
    const results = [
      await staffActions.createModelAction({ ...modelInput(), name: "" }),
      await staffActions.publishModelAction({ id: "not-a-uuid" }),
      await staffActions.adjustStockAction({ modelId, reason: "stolen", change: -1, note: "" }),
      await staffActions.receiveStockAction({
        modelId,
        count: 0,
        batch: "b",
        builderName: "Hollow Creek",
        note: "",
      }),
      await staffActions.recordInspectionAction({
        modelId,
        measured: {},
        inspector: "T",
        inspectedOn: "yesterday",
        notes: "",
      }),
      await staffActions.updatePhotoAltAction({ id: PHOTO_ID, altText: "" }),
    ];
    for (const r of results) {
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.error.code).toBe("bad_request");
        expect(r.error.message.length).toBeGreaterThan(10);
      }
    }
    expect(await snapshot()).toEqual(before);
  });
});
