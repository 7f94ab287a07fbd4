import "server-only";
import { eq, like, or } from "drizzle-orm";
import { getDb, type Tx } from "@/db/client";
import { houseModels, type HouseModelRow } from "@/db/schema";
import { houseSpecSchema } from "@/lib/catalog/spec";
import { AppError } from "@/lib/http/errors";
import { getLatestInspections } from "@/lib/inspections/queries";
import { firstFreeSlug, slugify, type ModelInput, type UpdateModelInput } from "../model-input";
import { publishRefusals } from "../publishing";

function columns(input: ModelInput) {
  return {
    name: input.name,
    tagline: input.tagline,
    description: input.description,
    priceCents: input.priceCents,
    spec: input.spec,
    mounts: input.mounts,
    backToBackKit: input.backToBackKit,
    builderName: input.builderName,
    cartonLengthIn: input.carton.lengthIn,
    cartonWidthIn: input.carton.widthIn,
    cartonHeightIn: input.carton.heightIn,
    cartonWeightLb: input.carton.weightLb,
    lowStockThreshold: input.lowStockThreshold,
  };
}

async function lockedModel(tx: Tx, id: string): Promise<HouseModelRow> {
  const [row] = await tx.select().from(houseModels).where(eq(houseModels.id, id)).for("update");
  if (!row) throw new AppError("not_found", "There is no house model with that id.");
  return row;
}

/** A new model starts as a draft with no stock; its slug is made once, from its name. */
export async function createModel({
  input,
}: {
  input: ModelInput;
}): Promise<{ id: string; slug: string }> {
  const db = await getDb();
  const base = slugify(input.name);
  // A few tries: two staff naming models alike at the same moment race for one slug.
  for (let attempt = 0; attempt < 3; attempt++) {
    const taken = await db
      .select({ slug: houseModels.slug })
      .from(houseModels)
      .where(or(eq(houseModels.slug, base), like(houseModels.slug, `${base}-%`)));
    const slug = firstFreeSlug({ base, taken: new Set(taken.map((t) => t.slug)) });
    const [row] = await db
      .insert(houseModels)
      .values({ slug, status: "draft", stock: 0, ...columns(input) })
      .onConflictDoNothing()
      .returning({ id: houseModels.id, slug: houseModels.slug });
    if (row) return row;
  }
  throw new AppError("conflict", "Another model with this name was just added. Please save again.");
}

/**
 * Saves an edit. A model on sale must stay publishable: an edit that would break a required
 * criterion or stop matching its inspection is refused, with the reasons, until it is back in drafts.
 */
export async function updateModel({
  input,
  now = new Date(),
}: {
  input: UpdateModelInput;
  now?: Date;
}): Promise<{ id: string; slug: string }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const row = await lockedModel(tx, input.id);
    if (row.status === "published") {
      const latest =
        (await getLatestInspections({ db: tx, modelIds: [row.id] })).get(row.id) ?? null;
      const refusals = publishRefusals({ spec: input.spec, latestInspection: latest, now });
      if (refusals.length > 0) {
        throw new AppError(
          "conflict",
          `This model is on sale, and the change would take it off our criteria: ${refusals.join(" ")} Return it to drafts first to make this change.`,
        );
      }
    }
    await tx.update(houseModels).set(columns(input)).where(eq(houseModels.id, row.id));
    return { id: row.id, slug: row.slug };
  });
}

/** Puts a model on sale, or refuses with every reason it cannot go (checked here, never only in the page). */
export async function publishModel({
  id,
  now = new Date(),
}: {
  id: string;
  now?: Date;
}): Promise<{ slug: string }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const row = await lockedModel(tx, id);
    if (row.status === "published") return { slug: row.slug };
    const spec = houseSpecSchema.parse(row.spec);
    const latest = (await getLatestInspections({ db: tx, modelIds: [row.id] })).get(row.id) ?? null;
    const refusals = publishRefusals({ spec, latestInspection: latest, now });
    if (refusals.length > 0) {
      const reasons: Record<string, string> = Object.fromEntries(
        refusals.map((r, i) => [`reason${i + 1}`, r]),
      );
      throw new AppError(
        "conflict",
        `${row.name} cannot go on sale yet. ${refusals.join(" ")}`,
        reasons,
      );
    }
    await tx
      .update(houseModels)
      .set({ status: "published", publishedAt: now })
      .where(eq(houseModels.id, row.id));
    return { slug: row.slug };
  });
}

/**
 * Takes a model off sale. The row stays (orders, the ledger and inspections all point at it), so
 * past orders keep their lines, prices and names exactly as sold.
 */
export async function retireModel({ id }: { id: string }): Promise<{ slug: string }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const row = await lockedModel(tx, id);
    if (row.status !== "retired")
      await tx.update(houseModels).set({ status: "retired" }).where(eq(houseModels.id, row.id));
    return { slug: row.slug };
  });
}

/** Back to drafts (from sale or retirement) for changes; publishing again runs every check again. */
export async function returnModelToDrafts({ id }: { id: string }): Promise<{ slug: string }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const row = await lockedModel(tx, id);
    if (row.status !== "draft")
      await tx.update(houseModels).set({ status: "draft" }).where(eq(houseModels.id, row.id));
    return { slug: row.slug };
  });
}
