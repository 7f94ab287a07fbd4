/**
 * What a form posted without script says after its redirect (post, redirect, get): the address
 * carries a short code, never the message, the e-mail or the password, so a crafted link cannot
 * put words of its own on the store's pages. Common practice, no source.
 */
export const FORM_NOTICES = {
  "sign-in-missing": "Enter your e-mail address and password.",
  "sign-in-refused": "That e-mail and password don't match an account here.",
  "sign-in-throttled": "Too many tries just now. Wait a few minutes, then try again.",
  "sign-up-refused": "We could not create the account. Check each field (the password needs to be longer and less common, or the e-mail may already have an account), then try again.",
} as const;

export type FormNotice = keyof typeof FORM_NOTICES;

/** The notice a `?notice=` value names, or null for anything else. */
export function formNotice(value: string | string[] | undefined): string | null {
  return typeof value === "string" && Object.hasOwn(FORM_NOTICES, value) ? FORM_NOTICES[value as FormNotice] : null;
}

/** The sign-in notice for a refusal's message (the throttle's message names its own wait). */
export function signInNoticeFor(message: string): FormNotice {
  if (message === FORM_NOTICES["sign-in-missing"]) return "sign-in-missing";
  if (message === FORM_NOTICES["sign-in-refused"]) return "sign-in-refused";
  return "sign-in-throttled";
}
