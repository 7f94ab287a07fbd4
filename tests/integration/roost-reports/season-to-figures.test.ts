import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import wilsonLower from "wilson-score";
import { getDb } from "@/db/client";
import { houseModels, orderEvents, orders, roostReportLinkUses, roostReports } from "@/db/schema";
import { GET as getHouse } from "@/app/api/houses/[slug]/route";
import { seedDemo } from "@/lib/demo/commands";
import { deliverPendingMail } from "@/lib/mail/commands/sender";
import { changeOrderStatus } from "@/lib/orders/commands";
import { reviewRoostReport } from "@/lib/roost-reports/commands";
import { answerFromLink, previewLinkAnswer } from "@/lib/roost-reports/link-answers";
import { listReportQuestionsForViewer, reportFromOrderPage } from "@/lib/roost-reports/order-reports";
import { getModelOccupancy, getOccupancyPicture } from "@/lib/roost-reports/queries";
import { queueRoostReportMail } from "@/lib/roost-reports/commands";
import { signOptOutToken } from "@/lib/roost-reports/report-tokens";
import { wilsonInterval, Z_95 } from "@/lib/roost-reports/wilson-interval";
import { env } from "@/lib/config/env";
import type { MailStandIn } from "@/stand-ins/mail/server";
import type { StoredMessage } from "@/stand-ins/mail/message-store";
import { resetDb } from "../../support/db";
import { startTestPayments } from "../../support/payments";
import { demoUser } from "../fulfillment/support";
import { clearInbox, payForOrder, startTestMail } from "../mail/helpers";

// From a paid order to the public figures, through the real season job, the real mail and the
// one-click links it carries: PRODUCT.md §8. A guest buys six Hollow Four houses for pickup,
// collects them on May 2, 2025, and answers the questions of the 2025 and 2026 seasons. The
// demo reports are removed first so the counts are this buyer's alone.

const SLUG = "hollow-four";
const PICKED_UP = new Date(Date.UTC(2025, 4, 2, 17));
const day = (y: number, m: number, d: number) => new Date(Date.UTC(y, m - 1, d, 12));

let payments: Awaited<ReturnType<typeof startTestPayments>>;
let mail: MailStandIn;

beforeAll(async () => {
  payments = await startTestPayments();
  mail = await startTestMail();
});
afterAll(async () => {
  await payments.close();
  await mail.close();
});
beforeEach(async () => {
  const db = await resetDb();
  await seedDemo(db);
  await db.delete(roostReports);
  await clearInbox(mail);
});

/** A paid guest order of `quantity` houses, collected at the front desk on PICKED_UP. */
async function collectedOrder(quantity: number): Promise<string> {
  const orderId = await payForOrder(payments, {
    items: [{ slug: SLUG, quantity }],
    method: "pickup",
    address: undefined,
    contact: { name: "Ysolde Marrow", email: "ysolde.marrow@example.org" },
  });
  const worker = await demoUser("fulfillment");
  const db = await getDb();
  for (const to of ["packing", "ready_for_pickup", "picked_up"] as const) {
    await db.transaction(async (tx) => {
      const [order] = await tx.select().from(orders).where(eq(orders.id, orderId));
      await changeOrderStatus(tx, { order: order!, to, actor: { id: worker.id, role: "fulfillment" }, note: "test" });
    });
  }
  // Time passes: the collection happened last spring.
  await db.update(orderEvents).set({ createdAt: PICKED_UP }).where(and(eq(orderEvents.orderId, orderId), eq(orderEvents.toStatus, "picked_up")));
  return orderId;
}

function messagesTo(subject: RegExp): StoredMessage[] {
  return mail.messages().filter((m) => m.to.includes("ysolde.marrow@example.org") && subject.test(m.subject));
}

type Links = Map<number, Record<string, string>>;

/** The answer links of one question e-mail, per house (unit) and answer, from its plain text. */
function answerLinks(message: StoredMessage): Links {
  const links: Links = new Map();
  const text = message.text ?? "";
  // Houses are listed in order, each with its four links; tokens carry the unit, read them back.
  for (const match of text.matchAll(/\/roost-reports\/answer\?token=([A-Za-z0-9._%-]+)/g)) {
    const token = decodeURIComponent(match[1]!);
    const claims = JSON.parse(Buffer.from(token.split(".")[1]!, "base64url").toString("utf8")) as { u: number; a: string };
    links.set(claims.u, { ...(links.get(claims.u) ?? {}), [claims.a]: token });
  }
  return links;
}

async function answer(links: Links, unit: number, choice: string, now: Date) {
  const token = links.get(unit)?.[choice];
  if (!token) throw new Error(`no ${choice} link for house ${unit}`);
  return answerFromLink({ input: { token, note: "" }, now });
}

async function modelId(): Promise<string> {
  const db = await getDb();
  const [row] = await db.select({ id: houseModels.id }).from(houseModels).where(eq(houseModels.slug, SLUG));
  return row!.id;
}

async function apiOccupancy() {
  const response = await getHouse(new Request(`http://localhost/api/houses/${SLUG}`), { params: Promise.resolve({ slug: SLUG }) });
  expect(response.status).toBe(200);
  return ((await response.json()) as { occupancy: Awaited<ReturnType<typeof getModelOccupancy>> }).occupancy;
}

describe("a paid order through the season job to the figures", () => {
  it("asks after each summer, records and changes answers from the links, and moves n, K and the Wilson bounds", async () => {
    const orderId = await collectedOrder(6);
    const id = await modelId();

    // Outside the question's window nothing is asked; on September 15 the 2025 question goes out, once.
    expect(await queueRoostReportMail({ now: day(2025, 8, 20) })).toEqual({ asked: 0, advised: 0 });
    expect(await queueRoostReportMail({ now: day(2025, 9, 15) })).toEqual({ asked: 1, advised: 0 });
    expect(await queueRoostReportMail({ now: day(2025, 9, 16) })).toEqual({ asked: 0, advised: 0 });
    await deliverPendingMail();
    const [first] = messagesTo(/^Did bats move in\? Your bat houses, summer 2025$/);
    expect(first, "the 2025 question in the inbox").toBeTruthy();
    // The unsubscribe headers, as for the seasonal reminders (RFC 2369 and RFC 8058).
    expect(first!.headers?.["List-Unsubscribe"]).toMatch(/^<http:\/\/[^>]+\/api\/roost-reports\/stop\?token=[^>]+>$/);
    expect(first!.headers?.["List-Unsubscribe-Post"]).toBe("List-Unsubscribe=One-Click");
    const links2025 = answerLinks(first!);
    expect([...links2025.keys()].sort()).toEqual([1, 2, 3, 4, 5, 6]);
    expect(Object.keys(links2025.get(1)!).sort()).toEqual(["bats_seen", "gone", "no_sign", "signs"]);

    // First summer: all empty so far. A first summer alone says nothing about two summers: n = 0.
    for (const unit of [1, 2, 3, 4, 5, 6]) expect((await answer(links2025, unit, "no_sign", day(2025, 9, 20))).outcome).toBe("recorded");
    expect((await getModelOccupancy({ modelId: id })).overall).toEqual({ n: 0, shown: false, demo: false });

    // The second summer's question.
    expect(await queueRoostReportMail({ now: day(2026, 9, 15) })).toEqual({ asked: 1, advised: 0 });
    await deliverPendingMail();
    const [second] = messagesTo(/summer 2026$/);
    const links2026 = answerLinks(second!);

    // Four answers: still fewer than five houses, so n but no rate, on the model's data and its JSON.
    await answer(links2026, 1, "bats_seen", day(2026, 9, 18));
    await answer(links2026, 2, "signs", day(2026, 9, 18));
    await answer(links2026, 3, "no_sign", day(2026, 9, 18));
    await answer(links2026, 4, "no_sign", day(2026, 9, 18));
    for (const occupancy of [await getModelOccupancy({ modelId: id }), await apiOccupancy()]) {
      expect(occupancy.overall).toEqual({ n: 4, shown: false, demo: false });
      expect(occupancy.overall).not.toHaveProperty("rate");
      expect(occupancy.overall).not.toHaveProperty("k");
      expect(occupancy.firstOccupancy).toBeNull();
    }

    // The fifth house: n = 5, K = 2, and the interval is the Wilson score interval of 2/5.
    await answer(links2026, 5, "no_sign", day(2026, 9, 19));
    const at5 = await apiOccupancy();
    expect(at5.overall).toMatchObject({ n: 5, k: 2, shown: true, rate: 0.4 });
    // Against the wilson-score package (lower bound; upper = 1 − lower of the complement).
    expect(at5.overall.interval!.lower).toBeCloseTo(wilsonLower(2, 5, Z_95), 10);
    expect(at5.overall.interval!.upper).toBeCloseTo(1 - wilsonLower(3, 5, Z_95), 10);
    // 2/5 by hand: (p + z²/2n ± z√(p(1−p)/n + z²/4n²)) / (1 + z²/n) with z = 1.96 → 0.1176, 0.7693.
    expect(at5.overall.interval!.lower).toBeCloseTo(0.1176, 4);
    expect(at5.overall.interval!.upper).toBeCloseTo(0.7693, 4);
    expect(at5.firstOccupancy?.medianSummer).toBe(2);

    // House 6 answers "no sign yet", then a second click on another link changes it to bats seen;
    // the same link again is refused (each link works once) and writes nothing.
    expect((await answer(links2026, 6, "no_sign", day(2026, 9, 20))).outcome).toBe("recorded");
    const after6 = (await getModelOccupancy({ modelId: id })).overall;
    expect(after6).toMatchObject({ n: 6, k: 2 });
    const changedTo = await answer(links2026, 6, "bats_seen", day(2026, 9, 21));
    expect(changedTo.outcome).toBe("changed");
    const db = await getDb();
    const rowsBefore = (await db.select().from(roostReports)).length;
    const usesBefore = (await db.select().from(roostReportLinkUses)).length;
    await expect(answer(links2026, 6, "bats_seen", day(2026, 9, 22))).rejects.toMatchObject({
      code: "conflict",
      status: 409,
      message: expect.stringMatching(/^This link has already been used\. Your answer stands as “Bats seen”\./),
    });
    // The first used link of house 6 too, though its answer is no longer the current one.
    await expect(answer(links2026, 6, "no_sign", day(2026, 9, 22))).rejects.toMatchObject({ code: "conflict" });
    expect((await db.select().from(roostReports)).length).toBe(rowsBefore);
    expect((await db.select().from(roostReportLinkUses)).length).toBe(usesBefore);
    // Opening a used link says so before any button.
    expect(await previewLinkAnswer({ token: links2026.get(6)!.bats_seen!, now: day(2026, 9, 22) })).toMatchObject({
      ok: false,
      used: true,
      message: expect.stringMatching(/already been used\. Your answer stands as “Bats seen”/),
    });
    const changed = (await getModelOccupancy({ modelId: id })).overall;
    expect(changed).toMatchObject({ n: 6, k: 3, rate: 0.5 });
    expect(changed.interval).toEqual(wilsonInterval({ successes: 3, trials: 6 }));
    expect(changed.interval!.lower).toBeGreaterThan(after6.interval!.lower);

    // The answer stays changeable: the page after an answer offers fresh links for the other
    // answers (newly signed, each with its own id) and the private order page.
    expect(changedTo.others.map((o) => o.answer)).toEqual(["no_sign", "signs", "gone"]);
    expect(changedTo.orderPath).toMatch(new RegExp(`^/orders/${orderId}\\?t=[A-Za-z0-9_-]+$`));
    const emailTokens = new Set(Object.values(links2026.get(6)!));
    const freshSigns = decodeURIComponent(changedTo.others.find((o) => o.answer === "signs")!.href.split("token=")[1]!);
    expect(emailTokens.has(freshSigns)).toBe(false);
    const viaFresh = await answerFromLink({ input: { token: freshSigns, note: "" }, now: day(2026, 9, 23) });
    expect(viaFresh.outcome).toBe("changed");
    expect((await getModelOccupancy({ modelId: id })).overall).toMatchObject({ n: 6, k: 3 });
    await expect(answerFromLink({ input: { token: freshSigns, note: "" }, now: day(2026, 9, 23) })).rejects.toMatchObject({
      code: "conflict",
      message: expect.stringMatching(/Your answer stands as “Signs of bats”/),
    });
    const house6 = (await db.select().from(roostReports).where(eq(roostReports.season, 2026))).filter((r) => r.unit === 6);
    expect(house6.map((r) => [r.answer, r.current]).sort()).toEqual([["bats_seen", false], ["no_sign", false], ["signs", true]]);
    expect(house6.every((r) => r.reporter === "email_link" && r.reporterTokenHash?.length === 64 && r.reporterUserId === null)).toBe(true);

    // Staff mark house 1's report doubtful: it leaves the figures (n 5, K 2), with its reason kept.
    const [doubtful] = (await db.select().from(roostReports).where(and(eq(roostReports.season, 2026), eq(roostReports.current, true)))).filter((r) => r.unit === 1);
    const staff = await demoUser("staff");
    await reviewRoostReport({ input: { reportId: doubtful!.id, decision: "doubtful", reason: "Photo shows a bird nest, not bats." }, actorId: staff.id });
    expect((await apiOccupancy()).overall).toMatchObject({ n: 5, k: 2, rate: 0.4 });
    const picture = await getOccupancyPicture();
    expect(picture.byModel.find((m) => m.label === "Hollow Four")).toMatchObject({ n: 5, k: 2 });

    // A forged link and a link made for another purpose are refused, and record nothing.
    const good = links2026.get(3)!.signs!;
    const [v, body, sig] = good.split(".") as [string, string, string];
    const tampered = JSON.parse(Buffer.from(body, "base64url").toString("utf8")) as Record<string, unknown>;
    tampered.a = "bats_seen";
    const forged = `${v}.${Buffer.from(JSON.stringify(tampered)).toString("base64url")}.${sig}`;
    await expect(answerFromLink({ input: { token: forged, note: "" }, now: day(2026, 9, 23) })).rejects.toMatchObject({ code: "bad_request", message: expect.stringMatching(/not made by our store/) });
    const stopToken = signOptOutToken({ secret: env().NEXTAUTH_SECRET, claims: { orderId, email: "ysolde.marrow@example.org" }, now: day(2026, 9, 23) });
    await expect(answerFromLink({ input: { token: stopToken, note: "" }, now: day(2026, 9, 23) })).rejects.toMatchObject({ message: expect.stringMatching(/made for something else/) });
    expect((await apiOccupancy()).overall).toMatchObject({ n: 5, k: 2 });
    // A link for a season the house has not had yet is refused too (the 2026 links in 2025).
    await expect(answer(links2026, 3, "signs", day(2025, 12, 1))).rejects.toMatchObject({ message: expect.stringMatching(/not one this house has had yet/) });
  });

  it("records exactly one use when the same link is sent twice at the same instant", async () => {
    await collectedOrder(1);
    await queueRoostReportMail({ now: day(2026, 9, 15) });
    await deliverPendingMail();
    const links = answerLinks(messagesTo(/summer 2026$/)[0]!);
    const token = links.get(1)!.signs!;
    const settled = await Promise.allSettled([0, 1].map(() => answerFromLink({ input: { token, note: "" }, now: day(2026, 9, 18) })));
    const fulfilled = settled.filter((r) => r.status === "fulfilled");
    const rejected = settled.filter((r): r is PromiseRejectedResult => r.status === "rejected");
    expect(fulfilled.map((r) => r.value.outcome)).toEqual(["recorded"]);
    expect(rejected).toHaveLength(1);
    expect(rejected[0]!.reason).toMatchObject({ code: "conflict", message: expect.stringMatching(/already been used/) });
    const db = await getDb();
    expect(await db.select({ answer: roostReportLinkUses.answer }).from(roostReportLinkUses)).toEqual([{ answer: "signs" }]);
    expect((await db.select().from(roostReports)).map((r) => r.answer)).toEqual(["signs"]);
  });

  it("sends the gentle second-summer advice for houses still empty, linking the placement planner, with the unsubscribe headers", async () => {
    await collectedOrder(2);
    await queueRoostReportMail({ now: day(2026, 9, 15) });
    await deliverPendingMail();
    const links = answerLinks(messagesTo(/summer 2026$/)[0]!);
    // 2026 is these houses' second summer; one still empty, one with bats.
    await answer(links, 1, "no_sign", day(2026, 9, 18));
    await answer(links, 2, "bats_seen", day(2026, 9, 18));
    expect(await queueRoostReportMail({ now: day(2026, 10, 1) })).toEqual({ asked: 0, advised: 1 });
    expect(await queueRoostReportMail({ now: day(2026, 10, 2) })).toEqual({ asked: 0, advised: 0 });
    await deliverPendingMail();
    const [advice] = messagesTo(/^Still waiting for bats\?/);
    expect(advice, "the advice e-mail").toBeTruthy();
    expect(advice!.text).toMatch(/\/placement\b/);
    expect(advice!.text).toMatch(/sunnier/i);
    expect(advice!.text).toMatch(/Hollow Four, house 1 of 2/);
    expect(advice!.text).not.toMatch(/house 2 of 2/);
    expect(advice!.headers?.["List-Unsubscribe"]).toMatch(/\/api\/roost-reports\/stop\?token=/);
    expect(advice!.headers?.["List-Unsubscribe-Post"]).toBe("List-Unsubscribe=One-Click");
  });

  it("asks the same questions on the account page and the guest's private order page, only of the buyer", async () => {
    const orderId = await collectedOrder(2);
    const db = await getDb();
    const customer = await demoUser("customer");
    await db.update(orders).set({ userId: customer.id }).where(eq(orders.id, orderId));
    const [order] = await db.select().from(orders).where(eq(orders.id, orderId));
    const staff = await demoUser("staff");
    const other = { ...customer, id: staff.id };

    const asBuyer = await listReportQuestionsForViewer({ order: order!, token: null, user: customer });
    expect(asBuyer.map((q) => [q.unit, q.modelName, q.current])).toEqual([[1, "Hollow Four", null], [2, "Hollow Four", null]]);
    expect(asBuyer[0]!.summer).toBeGreaterThanOrEqual(1);
    expect(await listReportQuestionsForViewer({ order: order!, token: order!.accessToken, user: null })).toHaveLength(2);
    expect(await listReportQuestionsForViewer({ order: order!, token: null, user: other })).toEqual([]);
    expect(await listReportQuestionsForViewer({ order: order!, token: "not-the-token", user: null })).toEqual([]);

    const { season, orderLineId } = asBuyer[0]!;
    const input = { orderLineId, unit: 1, season, answer: "signs" as const, note: "Droppings on the porch rail.", countBand: undefined, mount: "building" as const };
    expect((await reportFromOrderPage({ orderId, accessToken: null, user: customer, input })).outcome).toBe("recorded");
    expect((await reportFromOrderPage({ orderId, accessToken: order!.accessToken, user: null, input: { ...input, unit: 2, answer: "no_sign" } })).outcome).toBe("recorded");
    // The shipping desk can open any order but cannot answer for its buyer; workshop staff cannot open it.
    const desk = await demoUser("fulfillment");
    await expect(reportFromOrderPage({ orderId, accessToken: null, user: desk, input })).rejects.toMatchObject({ code: "forbidden" });
    await expect(reportFromOrderPage({ orderId, accessToken: null, user: staff, input })).rejects.toMatchObject({ code: "not_found" });
    const rows = await db.select().from(roostReports).where(eq(roostReports.orderLineId, orderLineId));
    expect(rows.map((r) => [r.unit, r.answer, r.reporter, r.mount]).sort()).toEqual([[1, "signs", "account", "building"], [2, "no_sign", "order_link", "building"]]);
    const again = await listReportQuestionsForViewer({ order: order!, token: null, user: customer });
    expect(again.map((q) => q.current?.answer)).toEqual(["signs", "no_sign"]);
  });
});
