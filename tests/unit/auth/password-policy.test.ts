import { describe, expect, it } from "vitest";
import { passwordSchema, signUpSchema } from "@/lib/auth/password-policy";
import { can, PERMISSIONS, ROLES } from "@/lib/auth/roles";
import { navFor } from "@/lib/auth/nav";

// OWASP ASVS 5.0 (2025) 6.2.1 (≥ 8 characters), 6.2.9 (≥ 64 allowed), 6.2.5 (no composition rules), 6.2.4 (common list).
describe("password policy", () => {
  it("refuses 7 characters and accepts 8", () => {
    expect(passwordSchema.safeParse("abcdefg").success).toBe(false);
    expect(passwordSchema.safeParse("plum-owl").success).toBe(true);
  });
  it("allows at least 64 characters, including spaces and any script", () => {
    expect(passwordSchema.safeParse("x".repeat(64)).success).toBe(true);
    expect(passwordSchema.safeParse("correct horse battery staple ünïcödé 🦇").success).toBe(true);
  });
  it("has no composition rules: all lowercase letters are fine", () => {
    expect(passwordSchema.safeParse("quietcedarlantern").success).toBe(true);
  });
  it("refuses common passwords, whatever their case", () => {
    for (const p of ["password", "PASSWORD1", "12345678", "qwertyuiop", "iloveyou"]) {
      const r = passwordSchema.safeParse(p);
      expect(r.success, p).toBe(false);
      expect(r.error?.issues[0]?.message).toMatch(/commonly used/);
    }
  });
  it("gives a clear message for a short password on sign-up", () => {
    const r = signUpSchema.safeParse({ name: "Ana", email: "ana@example.org", password: "short" });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]).toMatchObject({ path: ["password"], message: "Use at least 8 characters." });
  });
  it("normalizes the e-mail", () => {
    const r = signUpSchema.parse({ name: "Ana", email: "  Ana@Example.ORG ", password: "quiet-cedar" });
    expect(r.email).toBe("ana@example.org");
  });
});

describe("roles", () => {
  it("is a closed set where only admin has admin permissions", () => {
    expect(ROLES).toEqual(["customer", "staff", "fulfillment", "admin"]);
    for (const role of ROLES) expect(can(role, "admin:users")).toBe(role === "admin");
    expect(can("fulfillment", "staff:models")).toBe(false);
    expect(can("staff", "fulfillment:orders")).toBe(false);
    expect(PERMISSIONS.admin.length).toBeGreaterThan(PERMISSIONS.staff.length);
  });
  it("shows each role its own areas in the navigation", () => {
    expect(navFor(null).map((n) => n.href)).not.toContain("/staff");
    expect(navFor("staff").map((n) => n.href)).toContain("/staff");
    expect(navFor("fulfillment").map((n) => n.href)).toContain("/fulfillment");
    expect(navFor("admin").map((n) => n.href)).toEqual(expect.arrayContaining(["/staff", "/fulfillment", "/admin"]));
  });
});
