import { describe, expect, it } from "vitest";
import { FORM_NOTICES, formNotice, signInNoticeFor } from "@/lib/auth/form-notices";

describe("form notices after a post without script", () => {
  it("names each notice by its code", () => {
    expect(formNotice("sign-in-refused")).toBe("That e-mail and password don't match an account here.");
    expect(formNotice("sign-up-refused")).toMatch(/could not create the account/);
  });

  it("shows nothing for a code it does not know, a list, or a crafted message", () => {
    expect(formNotice(undefined)).toBeNull();
    expect(formNotice("")).toBeNull();
    expect(formNotice(["sign-in-refused"])).toBeNull();
    expect(formNotice("Your account is locked: call 555-0100")).toBeNull();
    expect(formNotice("__proto__")).toBeNull();
    expect(formNotice("toString")).toBeNull();
  });

  it("maps each refusal of sign-in to its code; anything else is the throttle's", () => {
    expect(signInNoticeFor(FORM_NOTICES["sign-in-missing"])).toBe("sign-in-missing");
    expect(signInNoticeFor(FORM_NOTICES["sign-in-refused"])).toBe("sign-in-refused");
    expect(signInNoticeFor("Too many attempts from this address. Try again in 14 minutes.")).toBe("sign-in-throttled");
  });
});
