import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { Resend } from "resend";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { parseMailbox } from "@/stand-ins/mail/email-schema";
import { startMailStandIn, type MailStandIn } from "@/stand-ins/mail/server";

// The real `resend` SDK (v6) reads RESEND_BASE_URL when a client is constructed.
let standIn: MailStandIn;
let resend: Resend;
const dataDir = mkdtempSync(path.join(tmpdir(), "mail-stand-in-"));
const dataFile = path.join(dataDir, "nested", "mail.json");
const FROM = "Cedar Hollow store <store@cedarhollow.example>";

beforeAll(async () => {
  standIn = await startMailStandIn({ port: 0, dataFile });
  process.env.RESEND_BASE_URL = standIn.url;
  resend = new Resend("re_test_stand_in");
});
afterAll(async () => {
  await standIn.close();
  rmSync(dataDir, { recursive: true, force: true });
});
beforeEach(async () => {
  standIn.setDown(false);
  await fetch(`${standIn.url}/_stand-in/messages`, { method: "DELETE" });
});

describe("sending", () => {
  it("accepts an e-mail and returns it by id, as the SDK expects", async () => {
    const { data, error } = await resend.emails.send({
      from: FROM,
      to: "buyer@example.test",
      cc: ["helper@example.test"],
      replyTo: "care@cedarhollow.example",
      subject: "Your roost house is on its way",
      html: "<h1>On its way</h1><p>Tracking: 1Z999</p>",
      text: "On its way. Tracking: 1Z999",
      headers: { "X-Order-Id": "ord_1001" },
      tags: [{ name: "kind", value: "shipment" }],
    });
    expect(error).toBeNull();
    expect(data?.id).toMatch(/^[0-9a-f-]{36}$/);
    const fetched = await resend.emails.get(data!.id);
    expect(fetched.error).toBeNull();
    expect(fetched.data).toMatchObject({
      object: "email",
      to: ["buyer@example.test"],
      cc: ["helper@example.test"],
      reply_to: ["care@cedarhollow.example"],
      subject: "Your roost house is on its way",
      last_event: "delivered",
    });
    expect(standIn.messages()[0]?.headers).toEqual({ "X-Order-Id": "ord_1001" });
  });

  it("batch-sends and stores each message", async () => {
    const { data, error } = await resend.batch.send([
      { from: FROM, to: ["a@example.test"], subject: "One", text: "1" },
      { from: FROM, to: ["b@example.test"], subject: "Two", text: "2" },
    ]);
    expect(error).toBeNull();
    expect(data?.data).toHaveLength(2);
    expect(standIn.messages().map((message) => message.subject)).toEqual(["Two", "One"]);
  });

  it("hands validation problems back in `error` (no throw), in the API's shape", async () => {
    const badFrom = await resend.emails.send({
      from: "not an address",
      to: "a@example.test",
      subject: "x",
      text: "x",
    });
    expect(badFrom.data).toBeNull();
    expect(badFrom.error).toMatchObject({ statusCode: 422, name: "validation_error" });
    expect(badFrom.error?.message).toContain("Invalid `from` field");
    const noSubject = await resend.emails.send({
      from: FROM,
      to: "a@example.test",
      text: "x",
    } as Parameters<typeof resend.emails.send>[0]);
    expect(noSubject.error).toMatchObject({
      statusCode: 422,
      name: "missing_required_field",
      message: "Missing `subject` field.",
    });
    const badBatch = await resend.batch.send([
      { from: FROM, to: ["a@example.test"], subject: "Fine", text: "1" },
      { from: FROM, to: ["nope"], subject: "Bad", text: "2" },
    ]);
    expect(badBatch.error?.message).toMatch(/^emails\[1\]: Invalid `to` field/);
    expect(standIn.messages()).toHaveLength(0);
  });

  it("refuses a missing or malformed API key", async () => {
    const missing = await fetch(`${standIn.url}/emails`, { method: "POST", body: "{}" });
    expect(missing.status).toBe(401);
    expect(await missing.json()).toMatchObject({ statusCode: 401, name: "missing_api_key" });
    const wrong = await new Resend("sk_not_mail").emails.send({
      from: FROM,
      to: "a@example.test",
      subject: "x",
      text: "x",
    });
    expect(wrong.error).toMatchObject({ statusCode: 403, name: "invalid_api_key" });
  });
});

describe("idempotency and outages", () => {
  it("replays an idempotency key: same id, stored once; another payload with it is refused", async () => {
    const email = {
      from: FROM,
      to: "donor@example.test",
      subject: "Thank you for your gift",
      text: "Receipt",
    };
    const first = await resend.emails.send(email, { idempotencyKey: "receipt/gift_77" });
    const second = await resend.emails.send(email, { idempotencyKey: "receipt/gift_77" });
    expect(second.data?.id).toBe(first.data?.id);
    expect(standIn.messages()).toHaveLength(1);
    const changed = await resend.emails.send(
      { ...email, subject: "Other" },
      { idempotencyKey: "receipt/gift_77" },
    );
    expect(changed.error).toMatchObject({ statusCode: 409, name: "invalid_idempotent_request" });
  });

  it("answers 503 to every API call while down, then recovers", async () => {
    standIn.setDown(true);
    const down = await resend.emails.send({
      from: FROM,
      to: "a@example.test",
      subject: "x",
      text: "x",
    });
    expect(down.data).toBeNull();
    expect(down.error).toMatchObject({ statusCode: 503 });
    await fetch(`${standIn.url}/_stand-in/up`, { method: "POST" });
    const up = await resend.emails.send({
      from: FROM,
      to: "a@example.test",
      subject: "x",
      text: "x",
    });
    expect(up.error).toBeNull();
    await fetch(`${standIn.url}/_stand-in/down`, { method: "POST" });
    expect((await resend.emails.get(up.data!.id)).error?.statusCode).toBe(503);
  });
});

describe("inbox and persistence", () => {
  it("lists messages newest first and shows one with a sandboxed HTML preview", async () => {
    await resend.emails.send({ from: FROM, to: "first@example.test", subject: "First", text: "1" });
    const { data } = await resend.emails.send({
      from: FROM,
      to: "second@example.test",
      subject: "Second <b>bold</b>",
      html: `<p class="x">Hello "there"</p><script>alert(1)</script>`,
      text: "Hello there",
    });
    const inbox = await (await fetch(`${standIn.url}/`)).text();
    expect(inbox.indexOf("Second &lt;b&gt;")).toBeLessThan(inbox.indexOf("First"));
    const page = await fetch(`${standIn.url}/messages/${data!.id}`);
    expect(page.headers.get("content-security-policy")).toContain("default-src 'none'");
    const html = await page.text();
    expect(html).toContain(`sandbox=""`);
    expect(html).toContain(
      `srcdoc="&lt;p class=&quot;x&quot;&gt;Hello &quot;there&quot;&lt;/p&gt;&lt;script&gt;`,
    );
    expect(html).not.toContain("<script>");
    expect(html).toContain("<pre>Hello there</pre>");
    const json = (await (await fetch(`${standIn.url}/_stand-in/messages`)).json()) as {
      data: Array<{ subject: string }>;
    };
    expect(json.data.map((message) => message.subject)).toEqual(["Second <b>bold</b>", "First"]);
  });

  it("keeps messages in the data file across a restart", async () => {
    await resend.emails.send({ from: FROM, to: "kept@example.test", subject: "Kept", text: "k" });
    const saved = JSON.parse(readFileSync(dataFile, "utf8")) as {
      messages: Array<{ subject: string }>;
    };
    expect(saved.messages.map((message) => message.subject)).toEqual(["Kept"]);
    const again = await startMailStandIn({ port: 0, dataFile });
    try {
      expect(again.messages().map((message) => message.subject)).toEqual(["Kept"]);
    } finally {
      await again.close();
    }
  });
});

describe("mailbox parsing (RFC 5322 name-addr, simplified)", () => {
  it("reads bare and named addresses and refuses malformed ones", () => {
    expect(parseMailbox("ada@example.test")).toEqual({ name: null, email: "ada@example.test" });
    expect(parseMailbox(`"Ada Birch" <ada@example.test>`)).toEqual({
      name: "Ada Birch",
      email: "ada@example.test",
    });
    expect(parseMailbox("Ada <ada@example>")).toBeNull();
    expect(parseMailbox("ada@@example.test")).toBeNull();
    expect(parseMailbox("a b@example.test")).toBeNull();
  });
});
