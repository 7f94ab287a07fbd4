import { sql } from "drizzle-orm";
import {
  boolean,
  check,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  serial,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";
import { ORDER_STATUSES } from "./order-statuses";

// Lengths are stored in inches, weights in pounds, money in integer cents, times in UTC.

const timestamps = {
  createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { withTimezone: true, mode: "date" })
    .notNull()
    .defaultNow()
    .$onUpdate(() => new Date()),
};

export const roleEnum = pgEnum("role", ["customer", "staff", "fulfillment", "admin"]);

export const users = pgTable(
  "users",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    email: text("email").notNull(),
    name: text("name").notNull(),
    passwordHash: text("password_hash").notNull(),
    role: roleEnum("role").notNull().default("customer"),
    // Stored in the session token at sign-in and compared on every request: a password reset
    // or a role change bumps it, which ends every session signed in before.
    sessionVersion: integer("session_version").notNull().default(0),
    ...timestamps,
  },
  (t) => [uniqueIndex("users_email_key").on(t.email)],
);

/** Every sign-in attempt, so throttling holds across several app instances. */
export const signInAttempts = pgTable(
  "sign_in_attempts",
  {
    id: serial("id").primaryKey(),
    email: text("email").notNull(),
    ip: text("ip").notNull(),
    succeeded: boolean("succeeded").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("sign_in_attempts_email_idx").on(t.email, t.createdAt), index("sign_in_attempts_ip_idx").on(t.ip, t.createdAt)],
);

export const passwordResetTokens = pgTable("password_reset_tokens", {
  id: uuid("id").primaryKey().defaultRandom(),
  userId: uuid("user_id")
    .notNull()
    .references(() => users.id, { onDelete: "cascade" }),
  tokenHash: text("token_hash").notNull().unique(),
  expiresAt: timestamp("expires_at", { withTimezone: true, mode: "date" }).notNull(),
  usedAt: timestamp("used_at", { withTimezone: true, mode: "date" }),
  createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
});

/** The center's details printed on receipts; one row, id = 1. */
export const organization = pgTable(
  "organization",
  {
    id: integer("id").primaryKey().default(1),
    legalName: text("legal_name").notNull(),
    displayName: text("display_name").notNull(),
    street: text("street").notNull(),
    city: text("city").notNull(),
    state: text("state").notNull(),
    zip: text("zip").notNull(),
    taxId: text("tax_id").notNull(),
    email: text("email").notNull(),
    phone: text("phone").notNull(),
    ...timestamps,
  },
  (t) => [check("organization_single_row", sql`${t.id} = 1`)],
);

export const modelStatusEnum = pgEnum("model_status", ["draft", "published", "retired"]);

export const houseModels = pgTable(
  "house_models",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    slug: text("slug").notNull(),
    name: text("name").notNull(),
    tagline: text("tagline").notNull().default(""),
    description: text("description").notNull().default(""),
    status: modelStatusEnum("status").notNull().default("draft"),
    priceCents: integer("price_cents").notNull(),
    /** The listed design spec (lib/catalog/spec.ts), inches. */
    spec: jsonb("spec").notNull(),
    /** Mounts the model is built for: "pole", "building". */
    mounts: text("mounts").array().notNull().default(sql`'{}'::text[]`),
    backToBackKit: boolean("back_to_back_kit").notNull().default(false),
    builderName: text("builder_name").notNull().default(""),
    cartonLengthIn: doublePrecision("carton_length_in").notNull(),
    cartonWidthIn: doublePrecision("carton_width_in").notNull(),
    cartonHeightIn: doublePrecision("carton_height_in").notNull(),
    cartonWeightLb: doublePrecision("carton_weight_lb").notNull(),
    stock: integer("stock").notNull().default(0),
    lowStockThreshold: integer("low_stock_threshold").notNull().default(3),
    publishedAt: timestamp("published_at", { withTimezone: true, mode: "date" }),
    ...timestamps,
  },
  (t) => [
    uniqueIndex("house_models_slug_key").on(t.slug),
    index("house_models_status_idx").on(t.status),
    check("house_models_stock_nonnegative", sql`${t.stock} >= 0`),
    check("house_models_price_positive", sql`${t.priceCents} > 0`),
  ],
);

export const modelPhotos = pgTable(
  "model_photos",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    modelId: uuid("model_id")
      .notNull()
      .references(() => houseModels.id, { onDelete: "cascade" }),
    position: integer("position").notNull().default(0),
    altText: text("alt_text").notNull(),
    /** Server-generated key prefix; sizes live at `${keyBase}-${width}.webp`. */
    keyBase: text("key_base").notNull(),
    widths: integer("widths").array().notNull(),
    width: integer("width").notNull(),
    height: integer("height").notNull(),
    ...timestamps,
  },
  (t) => [index("model_photos_model_idx").on(t.modelId, t.position)],
);

export const inspections = pgTable(
  "inspections",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    modelId: uuid("model_id")
      .notNull()
      .references(() => houseModels.id, { onDelete: "cascade" }),
    inspectedOn: timestamp("inspected_on", { withTimezone: true, mode: "date" }).notNull(),
    inspector: text("inspector").notNull(),
    /** Measured values of the built unit (lib/catalog/certification.ts). */
    measured: jsonb("measured").notNull(),
    passed: boolean("passed").notNull(),
    notes: text("notes").notNull().default(""),
    recordedById: uuid("recorded_by_id").references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("inspections_model_idx").on(t.modelId, t.inspectedOn)],
);

export const stockMovementKindEnum = pgEnum("stock_movement_kind", [
  "received",
  "adjusted",
  "reserved",
  "sold",
  "released",
]);

/** The stock ledger: house_models.stock changes only together with a row here. */
export const stockMovements = pgTable(
  "stock_movements",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    modelId: uuid("model_id")
      .notNull()
      .references(() => houseModels.id),
    kind: stockMovementKindEnum("kind").notNull(),
    delta: integer("delta").notNull(),
    stockAfter: integer("stock_after").notNull(),
    reason: text("reason").notNull().default(""),
    batch: text("batch"),
    builderName: text("builder_name"),
    orderId: uuid("order_id"),
    actorId: uuid("actor_id").references(() => users.id),
    createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("stock_movements_model_idx").on(t.modelId, t.createdAt), index("stock_movements_order_idx").on(t.orderId)],
);

/** NOAA NCEI U.S. Climate Normals 1981–2010: July normal daily maximum per station. */
export const climateStations = pgTable("climate_stations", {
  id: text("id").primaryKey(),
  name: text("name").notNull(),
  state: text("state").notNull(),
  lat: doublePrecision("lat").notNull(),
  lon: doublePrecision("lon").notNull(),
  julyHighF: doublePrecision("july_high_f").notNull(),
  /** The July value's completeness flag (C, S, R, P, Q). */
  flag: text("flag").notNull(),
  /** The January normal daily high, °F: the warmest month south of the equator; null where NOAA has none. */
  janHighF: doublePrecision("jan_high_f"),
  janFlag: text("jan_flag"),
});

export const shippingRates = pgTable(
  "shipping_rates",
  {
    id: serial("id").primaryKey(),
    maxBillableLb: integer("max_billable_lb").notNull(),
    cents: integer("cents").notNull(),
    ...timestamps,
  },
  (t) => [uniqueIndex("shipping_rates_tier_key").on(t.maxBillableLb), check("shipping_rates_cents", sql`${t.cents} >= 0`)],
);

export const taxRates = pgTable(
  "tax_rates",
  {
    state: text("state").primaryKey(),
    basisPoints: integer("basis_points").notNull(),
    ...timestamps,
  },
  (t) => [check("tax_rates_range", sql`${t.basisPoints} >= 0 and ${t.basisPoints} <= 2000`)],
);

export const orderStatusEnum = pgEnum("order_status", ORDER_STATUSES);
export const shippingMethodEnum = pgEnum("shipping_method", ["parcel", "pickup", "none"]);

export const orders = pgTable(
  "orders",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    number: serial("number").notNull(),
    userId: uuid("user_id").references(() => users.id),
    email: text("email").notNull(),
    name: text("name").notNull(),
    /** Unguessable token for a guest's order link. */
    accessToken: text("access_token").notNull(),
    status: orderStatusEnum("status").notNull().default("pending_payment"),
    method: shippingMethodEnum("method").notNull(),
    shipTo: jsonb("ship_to"),
    subtotalCents: integer("subtotal_cents").notNull(),
    shippingCents: integer("shipping_cents").notNull(),
    taxCents: integer("tax_cents").notNull(),
    giftCents: integer("gift_cents").notNull(),
    totalCents: integer("total_cents").notNull(),
    refundedCents: integer("refunded_cents").notNull().default(0),
    paymentIntentId: text("payment_intent_id"),
    reservedUntil: timestamp("reserved_until", { withTimezone: true, mode: "date" }),
    /** True while the order's units are reserved in the stock ledger (released on failure or expiry). */
    stockHeld: boolean("stock_held").notNull().default(false),
    phone: text("phone"),
    paidAt: timestamp("paid_at", { withTimezone: true, mode: "date" }),
    /** The saved site check that goes with the order (lib/placement), if any. */
    siteId: uuid("site_id"),
    /** The climate band the buyer saw when they checked out (lib/climate/order-band.ts); null when none was chosen. */
    bandId: text("band_id"),
    /** Where that band came from: zip, typed, site, chosen (picked from the list) or none. */
    bandSource: text("band_source"),
    /** The warmest month's average daily high behind the band, °F, unrounded. */
    bandValueF: doublePrecision("band_value_f"),
    bandZip: text("band_zip"),
    /** What the buyer typed, in their unit ("F" or "C"). */
    bandTypedValue: doublePrecision("band_typed_value"),
    bandTypedUnit: text("band_typed_unit"),
    /** Bumped on every state change; a stale version loses (two volunteers at once). */
    version: integer("version").notNull().default(0),
    ...timestamps,
  },
  (t) => [
    uniqueIndex("orders_number_key").on(t.number),
    uniqueIndex("orders_payment_intent_key").on(t.paymentIntentId),
    index("orders_status_idx").on(t.status, t.createdAt),
    index("orders_user_idx").on(t.userId),
    check("orders_amounts", sql`${t.totalCents} >= 0 and ${t.refundedCents} >= 0 and ${t.refundedCents} <= ${t.totalCents}`),
  ],
);

export const orderLines = pgTable(
  "order_lines",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    modelId: uuid("model_id")
      .notNull()
      .references(() => houseModels.id),
    slug: text("slug").notNull(),
    name: text("name").notNull(),
    unitPriceCents: integer("unit_price_cents").notNull(),
    quantity: integer("quantity").notNull(),
    billableLb: integer("billable_lb").notNull(),
  },
  (t) => [index("order_lines_order_idx").on(t.orderId), check("order_lines_quantity", sql`${t.quantity} between 1 and 10`)],
);

/** Who moved an order from which state to which, when and why. */
export const orderEvents = pgTable(
  "order_events",
  {
    id: serial("id").primaryKey(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    fromStatus: orderStatusEnum("from_status"),
    toStatus: orderStatusEnum("to_status").notNull(),
    actorId: uuid("actor_id").references(() => users.id),
    note: text("note").notNull().default(""),
    createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("order_events_order_idx").on(t.orderId, t.createdAt)],
);

export const carrierEnum = pgEnum("carrier", ["ups", "usps", "fedex", "other"]);

export const parcels = pgTable(
  "parcels",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id, { onDelete: "cascade" }),
    description: text("description").notNull(),
    lengthIn: doublePrecision("length_in").notNull(),
    widthIn: doublePrecision("width_in").notNull(),
    heightIn: doublePrecision("height_in").notNull(),
    weightLb: doublePrecision("weight_lb").notNull(),
    billableLb: integer("billable_lb").notNull(),
    carrier: carrierEnum("carrier"),
    service: text("service"),
    trackingNumber: text("tracking_number"),
    shippedAt: timestamp("shipped_at", { withTimezone: true, mode: "date" }),
    ...timestamps,
  },
  (t) => [index("parcels_order_idx").on(t.orderId)],
);

export const refundStatusEnum = pgEnum("refund_status", ["requested", "succeeded", "failed"]);
export const refundCauseEnum = pgEnum("refund_cause", ["cancel", "refund", "automatic"]);

/**
 * Money going back to a buyer. The row is written first, in the transaction that decides the
 * refund (status "requested", with its idempotency key); the payment service is called only
 * after that commits, and its answer is recorded by a follow-up that is safe to repeat
 * (lib/checkout/commands/refunds.ts). A sweeper retries requested refunds that were never
 * confirmed. Rows from before this flow were recorded after the call, hence the defaults.
 */
export const refunds = pgTable(
  "refunds",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id),
    /** The payment service's refund id, once it has answered. */
    providerRefundId: text("provider_refund_id").unique(),
    /** Sent with every call for this refund, so a repeated call never refunds twice. */
    idempotencyKey: text("idempotency_key")
      .notNull()
      .unique()
      .default(sql`gen_random_uuid()::text`),
    paymentIntentId: text("payment_intent_id"),
    status: refundStatusEnum("status").notNull().default("succeeded"),
    /** Which message the buyer gets once the money has moved. */
    cause: refundCauseEnum("cause").notNull().default("refund"),
    amountCents: integer("amount_cents").notNull(),
    reason: text("reason").notNull().default(""),
    restocked: boolean("restocked").notNull().default(false),
    actorId: uuid("actor_id").references(() => users.id),
    attempts: integer("attempts").notNull().default(0),
    nextAttemptAt: timestamp("next_attempt_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
    lastError: text("last_error"),
    confirmedAt: timestamp("confirmed_at", { withTimezone: true, mode: "date" }),
    createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    index("refunds_order_idx").on(t.orderId),
    index("refunds_requested_idx").on(t.status, t.nextAttemptAt),
    check("refunds_amount", sql`${t.amountCents} > 0`),
  ],
);

/** Conservation gifts, recorded when their payment succeeds. */
export const gifts = pgTable(
  "gifts",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id")
      .notNull()
      .references(() => orders.id)
      .unique(),
    userId: uuid("user_id").references(() => users.id),
    email: text("email").notNull(),
    amountCents: integer("amount_cents").notNull(),
    receivedAt: timestamp("received_at", { withTimezone: true, mode: "date" }).notNull(),
    /** For a monthly gift's payment: the paid invoice (one gift per invoice) and the monthly gift. */
    invoiceId: text("invoice_id").unique(),
    monthlyGiftId: uuid("monthly_gift_id"),
  },
  (t) => [index("gifts_user_idx").on(t.userId, t.receivedAt), index("gifts_email_idx").on(t.email)],
);

/** Payment-service events, each recorded once and processed once. */
export const webhookEvents = pgTable("webhook_events", {
  id: text("id").primaryKey(),
  type: text("type").notNull(),
  receivedAt: timestamp("received_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  processedAt: timestamp("processed_at", { withTimezone: true, mode: "date" }),
  outcome: text("outcome").notNull().default(""),
});

export const outboxStatusEnum = pgEnum("outbox_status", ["pending", "sent", "failed"]);

/** Messages written in the same transaction as the event that causes them; a sender delivers them. */
export const outbox = pgTable(
  "outbox",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    /** One message per cause: e.g. "order-confirmation:<orderId>". */
    dedupeKey: text("dedupe_key").notNull(),
    kind: text("kind").notNull(),
    toAddress: text("to_address").notNull(),
    subject: text("subject").notNull(),
    payload: jsonb("payload").notNull(),
    status: outboxStatusEnum("status").notNull().default("pending"),
    attempts: integer("attempts").notNull().default(0),
    nextAttemptAt: timestamp("next_attempt_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
    providerId: text("provider_id"),
    lastError: text("last_error"),
    sentAt: timestamp("sent_at", { withTimezone: true, mode: "date" }),
    ...timestamps,
  },
  (t) => [uniqueIndex("outbox_dedupe_key").on(t.dedupeKey), index("outbox_pending_idx").on(t.status, t.nextAttemptAt)],
);

export const emailPreferences = pgTable("email_preferences", {
  userId: uuid("user_id")
    .primaryKey()
    .references(() => users.id, { onDelete: "cascade" }),
  seasonalReminders: boolean("seasonal_reminders").notNull().default(false),
  unsubscribeToken: text("unsubscribe_token").notNull().unique(),
  ...timestamps,
});

/** A buyer's planned site and its check (lib/placement). */
export const sites = pgTable(
  "sites",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: uuid("user_id").references(() => users.id, { onDelete: "cascade" }),
    /** For a guest: a token kept with their cart. */
    guestToken: text("guest_token"),
    name: text("name").notNull().default("My site"),
    input: jsonb("input").notNull(),
    result: jsonb("result").notNull(),
    label: text("label").notNull(),
    bandId: text("band_id").notNull(),
    /** The skyline: 16 elevation angles (degrees, 0–90), north first and clockwise; null for open sky. */
    skyline: doublePrecision("skyline").array(),
    ...timestamps,
  },
  (t) => [
    index("sites_user_idx").on(t.userId),
    index("sites_guest_idx").on(t.guestToken),
    check("sites_skyline_16", sql`${t.skyline} is null or cardinality(${t.skyline}) = 16`),
  ],
);

// Roost reports (PRODUCT.md §8): did bats move into a house sold here? One current answer per
// house (a unit of an order line) per season; a changed answer keeps the old row as history.
export const roostAnswerEnum = pgEnum("roost_answer", ["no_sign", "signs", "bats_seen", "gone"]);
export const roostCountBandEnum = pgEnum("roost_count_band", ["1-10", "11-50", "51-200", "over-200"]);
export const roostReporterEnum = pgEnum("roost_reporter", ["account", "order_link", "email_link", "demo"]);
export const roostReviewEnum = pgEnum("roost_review", ["new", "accepted", "doubtful", "follow_up"]);

export const roostReports = pgTable(
  "roost_reports",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    /** "<orderLineId>:<unit>" for a house sold here, "demo:<n>" for an invented one. */
    houseKey: text("house_key").notNull(),
    orderLineId: uuid("order_line_id").references(() => orderLines.id, { onDelete: "cascade" }),
    unit: integer("unit").notNull(),
    modelId: uuid("model_id")
      .notNull()
      .references(() => houseModels.id),
    /** The year the season's maternity months start in (a southern season runs into the next year). */
    season: integer("season").notNull(),
    hemisphere: text("hemisphere").notNull(),
    /** Which summer of the house this season is: 1 = its first; 0 = it went up too late in this one. */
    summer: integer("summer").notNull(),
    answer: roostAnswerEnum("answer").notNull(),
    countBand: roostCountBandEnum("count_band"),
    note: text("note").notNull().default(""),
    photoKeyBase: text("photo_key_base"),
    photoWidths: integer("photo_widths").array(),
    /** The saved site that went with the order, by reference only; never copied. */
    siteId: uuid("site_id"),
    bandId: text("band_id"),
    mount: text("mount"),
    state: text("state"),
    siteRating: text("site_rating"),
    reporter: roostReporterEnum("reporter").notNull(),
    reporterUserId: uuid("reporter_user_id").references(() => users.id, { onDelete: "set null" }),
    /** SHA-256 of the order link or e-mail token used, so a report can be traced without keeping the token. */
    reporterTokenHash: text("reporter_token_hash"),
    current: boolean("current").notNull().default(true),
    replacedAt: timestamp("replaced_at", { withTimezone: true, mode: "date" }),
    review: roostReviewEnum("review").notNull().default("new"),
    reviewReason: text("review_reason").notNull().default(""),
    reviewedById: uuid("reviewed_by_id").references(() => users.id, { onDelete: "set null" }),
    reviewedAt: timestamp("reviewed_at", { withTimezone: true, mode: "date" }),
    demo: boolean("demo").notNull().default(false),
    reportedAt: timestamp("reported_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("roost_reports_current_key").on(t.houseKey, t.season).where(sql`${t.current}`),
    index("roost_reports_model_idx").on(t.modelId),
    index("roost_reports_review_idx").on(t.review, t.reportedAt),
    index("roost_reports_line_idx").on(t.orderLineId),
    check("roost_reports_unit", sql`${t.unit} between 1 and 10`),
    check("roost_reports_summer", sql`${t.summer} >= 0`),
    check("roost_reports_count_band", sql`${t.countBand} is null or ${t.answer} = 'bats_seen'`),
  ],
);

/**
 * Answer links from the e-mails are single-use: each signed answer token carries a random id, kept
 * here (with what it answered) when the link records an answer, in the same transaction.
 */
export const roostReportLinkUses = pgTable("roost_report_link_uses", {
  nonce: text("nonce").primaryKey(),
  houseKey: text("house_key").notNull(),
  season: integer("season").notNull(),
  answer: roostAnswerEnum("answer").notNull(),
  usedAt: timestamp("used_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
});

/** Addresses that asked for no more end-of-season questions (one click, no sign-in). */
export const roostAskOptOuts = pgTable("roost_ask_opt_outs", {
  email: text("email").primaryKey(),
  createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
});

export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;
export type HouseModelRow = typeof houseModels.$inferSelect;
export type NewHouseModelRow = typeof houseModels.$inferInsert;
export type OrderRow = typeof orders.$inferSelect;
export type OrderLineRow = typeof orderLines.$inferSelect;
export type ParcelRow = typeof parcels.$inferSelect;
export type OutboxRow = typeof outbox.$inferSelect;
export type RefundRow = typeof refunds.$inferSelect;
export type SiteRow = typeof sites.$inferSelect;
export type InspectionRow = typeof inspections.$inferSelect;
export type StockMovementRow = typeof stockMovements.$inferSelect;
export type RoostReportRow = typeof roostReports.$inferSelect;

/**
 * The center's giving and planning settings; one row, id = 1 (kept apart from `organization`,
 * the details printed on receipts). Dates and years of gifts are read in `timeZone` (PRODUCT.md §6).
 */
export const givingSettings = pgTable(
  "giving_settings",
  {
    id: integer("id").primaryKey().default(1),
    /** IANA zone name of the center's own calendar. The demo center is in Oregon. */
    timeZone: text("time_zone").notNull().default("America/Los_Angeles"),
    /** The card fee a donor may choose to cover: a percentage (basis points) plus a fixed part. */
    feeBasisPoints: integer("fee_basis_points").notNull().default(290),
    feeFixedCents: integer("fee_fixed_cents").notNull().default(30),
    /** Weeks the workshop needs to build and certify a batch of houses (the build plan). */
    leadTimeWeeks: integer("lead_time_weeks").notNull().default(6),
    ...timestamps,
  },
  (t) => [
    check("giving_settings_single_row", sql`${t.id} = 1`),
    check("giving_settings_fee", sql`${t.feeBasisPoints} between 0 and 1000 and ${t.feeFixedCents} between 0 and 500`),
    check("giving_settings_lead", sql`${t.leadTimeWeeks} between 0 and 52`),
  ],
);

export const monthlyGiftStatusEnum = pgEnum("monthly_gift_status", ["pending", "active", "past_due", "stopped"]);

/**
 * A donor's monthly gift: a subscription at the payment service. Each paid invoice becomes its
 * own order and gift (PRODUCT.md §6: each payment is its own contribution). `pending` until the
 * first payment; `past_due` after a failed renewal; `stopped` once the subscription has ended.
 */
export const monthlyGifts = pgTable(
  "monthly_gifts",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: uuid("user_id").references(() => users.id),
    email: text("email").notNull(),
    name: text("name").notNull(),
    amountCents: integer("amount_cents").notNull(),
    customerId: text("customer_id").notNull(),
    subscriptionId: text("subscription_id").notNull(),
    status: monthlyGiftStatusEnum("status").notNull().default("pending"),
    stoppedAt: timestamp("stopped_at", { withTimezone: true, mode: "date" }),
    ...timestamps,
  },
  (t) => [
    uniqueIndex("monthly_gifts_subscription_key").on(t.subscriptionId),
    index("monthly_gifts_user_idx").on(t.userId),
    index("monthly_gifts_customer_idx").on(t.customerId),
    check("monthly_gifts_amount", sql`${t.amountCents} between 100 and 1000000`),
  ],
);

/**
 * What a donor added to a gift beyond its amount: in honour or in memory of someone (with an
 * optional notice to a person they name, stating the amount only if they chose so), and the card
 * fee they chose to cover (part of the gift). One row per order (one-time) or per monthly gift.
 */
export const giftDedications = pgTable(
  "gift_dedications",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    orderId: uuid("order_id").references(() => orders.id, { onDelete: "cascade" }),
    monthlyGiftId: uuid("monthly_gift_id").references(() => monthlyGifts.id, { onDelete: "cascade" }),
    tributeKind: text("tribute_kind"),
    tributeName: text("tribute_name"),
    noticeName: text("notice_name"),
    noticeEmail: text("notice_email"),
    noticeShowsAmount: boolean("notice_shows_amount").notNull().default(false),
    feeCoveredCents: integer("fee_covered_cents").notNull().default(0),
    createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("gift_dedications_order_key").on(t.orderId),
    uniqueIndex("gift_dedications_monthly_key").on(t.monthlyGiftId),
    check("gift_dedications_kind", sql`${t.tributeKind} is null or ${t.tributeKind} in ('honor', 'memory')`),
    check("gift_dedications_fee", sql`${t.feeCoveredCents} >= 0`),
  ],
);

export type MonthlyGiftRow = typeof monthlyGifts.$inferSelect;
export type GiftDedicationRow = typeof giftDedications.$inferSelect;

/**
 * Cache invalidations shared by every app instance on one PostgreSQL server: each row is one
 * `updateTag`/`revalidateTag` made by one instance; the others read the rows they have not seen and
 * expire the same tags in their own memory (lib/caching/shared-tags-handler.mjs). Rows older than the
 * longest cache lifetime are deleted. Unused on the embedded database (one process, nothing to share).
 */
export const cacheTagEvents = pgTable(
  "cache_tag_events",
  {
    id: serial("id").primaryKey(),
    tags: text("tags").array().notNull(),
    // Seconds until the tags expire (revalidateTag's profile); null expires them at once (updateTag).
    expireSeconds: integer("expire_seconds"),
    instance: text("instance").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("cache_tag_events_created").on(t.createdAt)],
);
