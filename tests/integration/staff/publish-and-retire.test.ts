import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";

vi.mock("@/lib/auth/session", () => ({ getSessionUser: vi.fn(async () => null) }));

import {
  createModelAction,
  publishModelAction,
  retireModelAction,
  returnModelToDraftsAction,
  updateModelAction,
} from "@/lib/staff/actions";
import { recordInspectionAction } from "@/lib/staff/actions";
import { getDb } from "@/db/client";
import { houseModels, inspections, orderLines, orders } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { getSessionUser } from "@/lib/auth/session";
import { listHouses } from "@/lib/catalog/queries";
import type { ModelInput } from "@/lib/staff/model-input";
import { resetDb } from "../../support/db";
import { modelBySlug, sessionUserFor } from "./helpers";

// Product brief §1: a failing required criterion, or no passing inspection within 12 months,
// keeps a model off sale; measured values may differ from the listing by at most 1/16 in.

const session = vi.mocked(getSessionUser);

const input = (changes: Partial<ModelInput["spec"]> = {}): ModelInput => ({
  name: "Quarry Light",
  tagline: "Four chambers, light shade.",
  description: "",
  priceCents: 15_500,
  builderName: "Hollow Creek Joinery",
  mounts: ["pole", "building"],
  backToBackKit: false,
  carton: { lengthIn: 32, widthIn: 22, heightIn: 8.5, weightLb: 19 },
  lowStockThreshold: 2,
  spec: {
    chamberCount: 4,
    chamberGapIn: 0.75,
    chamberHeightIn: 24,
    chamberWidthIn: 16,
    landingAreaIn: 5,
    interiorSurface: "grooved",
    grooveSpacingIn: 0.375,
    grooveDepthIn: 0.0625,
    interiorFinish: "stained",
    seamsSealed: true,
    wood: "cedar",
    outerHeightIn: 30,
    outerWidthIn: 20,
    openBottom: true,
    exteriorShade: "light",
    vented: true,
    ...changes,
  },
});

const today = () => new Date().toISOString().slice(0, 10);
const measured = (changes: Record<string, unknown> = {}) => ({
  chamberGapIn: 0.75,
  chamberHeightIn: 24,
  chamberWidthIn: 16,
  landingAreaIn: 5,
  roughening: "grooved",
  seamsSealed: true,
  ...changes,
});

beforeEach(async () => {
  const db = await resetDb();
  await seedDemo(db);
  session.mockResolvedValue(await sessionUserFor(db, "staff"));
});

async function create(changes: Partial<ModelInput["spec"]> = {}) {
  const created = await createModelAction(input(changes));
  if (!created.ok) throw new Error(created.error.message);
  return created.data;
}

describe("publishing", () => {
  it("refuses a model with a failing required criterion, naming it, and leaves it a draft", async () => {
    const { id, slug } = await create({ chamberGapIn: 1.25 });
    const result = await publishModelAction({ id });
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.error.code).toBe("conflict");
      expect(result.error.message).toMatch(
        /Quarry Light cannot go on sale yet\. Chamber gap \(D1\): Crevices over 1 in/,
      );
    }
    expect((await modelBySlug(await getDb(), slug)).status).toBe("draft");
  });

  it("refuses a sound design until a built unit passes inspection, then publishes it into the catalog", async () => {
    const { id, slug } = await create();
    const refused = await publishModelAction({ id });
    expect(!refused.ok && refused.error.message).toMatch(/No built unit has been inspected yet/);

    const inspected = await recordInspectionAction({
      modelId: id,
      measured: measured(),
      inspector: "Tobias Marlow",
      inspectedOn: today(),
      notes: "",
    });
    expect(inspected).toMatchObject({ ok: true, data: { passed: true } });
    expect(await publishModelAction({ id })).toMatchObject({ ok: true, data: { slug } });
    const catalog = await listHouses({});
    expect(catalog.find((h) => h.slug === slug)).toMatchObject({
      certified: true,
      status: "published",
    });
  });

  it("passes an inspection off by exactly 1/16 in and fails one off by 1/16 in plus a little", async () => {
    const { id } = await create();
    const at = await recordInspectionAction({
      modelId: id,
      measured: measured({
        chamberGapIn: 0.75 + 1 / 16,
        chamberHeightIn: 24 - 1 / 16,
        chamberWidthIn: 16 + 1 / 16,
        landingAreaIn: 5 - 1 / 16,
      }),
      inspector: "Tobias Marlow",
      inspectedOn: today(),
      notes: "",
    });
    expect(at).toMatchObject({ ok: true, data: { passed: true } });

    // 1/16 in plus a thousandth of an inch: finer than any tape reads, still outside the tolerance.
    const over = await recordInspectionAction({
      modelId: id,
      measured: measured({ chamberWidthIn: 16 + 1 / 16 + 0.001 }),
      inspector: "Tobias Marlow",
      inspectedOn: today(),
      notes: "Measured twice.",
    });
    expect(over).toMatchObject({ ok: true, data: { passed: false } });
    if (over.ok)
      expect(over.data.result.measurements.find((m) => m.field === "chamberWidthIn")?.matches).toBe(
        false,
      );
    // The latest inspection failed, so the model cannot go on sale.
    const refused = await publishModelAction({ id });
    expect(!refused.ok && refused.error.message).toMatch(/latest inspection .* did not pass/);
    // 1/16 in is 1.5875 mm exactly (NIST SP 811, 2008: 1 in = 25.4 mm).
    expect((1 / 16) * 25.4).toBe(1.5875);
  });

  it("refuses an edit that would take a model on sale off our criteria, and allows it once back in drafts", async () => {
    const hollow = await modelBySlug(await getDb(), "hollow-four");
    const spec = { ...(hollow.spec as ModelInput["spec"]), chamberGapIn: 1.5 };
    const edit = { ...input(), name: hollow.name, id: hollow.id, spec };
    const refused = await updateModelAction(edit);
    expect(!refused.ok && refused.error.message).toMatch(
      /This model is on sale.*Chamber gap \(D1\)/,
    );
    expect(await returnModelToDraftsAction({ id: hollow.id })).toMatchObject({ ok: true });
    expect(await updateModelAction(edit)).toMatchObject({ ok: true });
    const publishAgain = await publishModelAction({ id: hollow.id });
    expect(!publishAgain.ok && publishAgain.error.message).toMatch(/Chamber gap \(D1\)/);
  });
});

describe("retiring", () => {
  it("takes a model out of the catalog and keeps its orders and their lines intact", async () => {
    const db = await getDb();
    const model = await modelBySlug(db, "twin-ridge");
    const [order] = await db
      .insert(orders)
      .values({
        email: "buyer@example.org",
        name: "Rowan Pike",
        accessToken: "t0ken",
        status: "delivered",
        method: "parcel",
        subtotalCents: 8900,
        shippingCents: 1900,
        taxCents: 0,
        giftCents: 0,
        totalCents: 10800,
      })
      .returning();
    await db
      .insert(orderLines)
      .values({
        orderId: order!.id,
        modelId: model.id,
        slug: model.slug,
        name: model.name,
        unitPriceCents: 8900,
        quantity: 1,
        billableLb: 12,
      });

    expect(await retireModelAction({ id: model.id })).toMatchObject({ ok: true });
    expect((await modelBySlug(db, "twin-ridge")).status).toBe("retired");
    expect((await listHouses({})).some((h) => h.slug === "twin-ridge")).toBe(false);
    const lines = await db.select().from(orderLines).where(eq(orderLines.orderId, order!.id));
    expect(lines).toEqual([
      expect.objectContaining({
        modelId: model.id,
        name: "Twin Ridge",
        unitPriceCents: 8900,
        quantity: 1,
      }),
    ]);
    // Its inspections stay on record, too.
    expect(
      (await db.select().from(inspections).where(eq(inspections.modelId, model.id))).length,
    ).toBe(1);
    // And it can come back: to drafts, then on sale again with its still-valid inspection.
    expect(await returnModelToDraftsAction({ id: model.id })).toMatchObject({ ok: true });
    expect(await publishModelAction({ id: model.id })).toMatchObject({ ok: true });
    expect(
      (await db.select().from(houseModels).where(eq(houseModels.id, model.id)))[0]?.status,
    ).toBe("published");
  });
});
