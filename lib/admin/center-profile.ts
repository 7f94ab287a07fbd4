// The center as the store names it to the public: the footer, the home page, page titles, the
// pickup line and the mail "from" name all read it from the organization settings (one row,
// edited on /admin/settings). Without a row the store names only itself.

/** The neutral name used when the center's settings are absent. */
export const FALLBACK_CENTER_NAME = "Roostwright";

export type CenterProfile = {
  /** false when no settings row exists and the fields below are the neutral fallback. */
  configured: boolean;
  name: string;
  street: string;
  city: string;
  state: string;
  zip: string;
  phone: string;
  email: string;
};

type OrganizationFields = {
  displayName: string;
  street: string;
  city: string;
  state: string;
  zip: string;
  phone: string;
  email: string;
};

export function centerProfile(org: OrganizationFields | null | undefined): CenterProfile {
  const name = org?.displayName.trim();
  if (!org || !name) {
    return { configured: false, name: FALLBACK_CENTER_NAME, street: "", city: "", state: "", zip: "", phone: "", email: "" };
  }
  return { configured: true, name, street: org.street, city: org.city, state: org.state, zip: org.zip, phone: org.phone, email: org.email };
}

/** The address part of a "Name <address>" or bare-address mailbox. */
export function mailboxAddress(mailbox: string): string {
  const angle = /<([^<>]+)>\s*$/.exec(mailbox);
  return (angle ? angle[1]! : mailbox).trim();
}

/**
 * The "from" mailbox: the operator's sending address with the center's name as display name
 * (RFC 5322 §3.4: a display name with special characters is sent as a quoted string). Without a
 * name the configured mailbox is used as it is.
 */
export function mailFrom(configured: string, displayName: string | null | undefined): string {
  // Control characters, quotes, backslashes and angle brackets could break or forge the header.
  const name = (displayName ?? "")
    .replace(/[\u0000-\u001f\u007f]/g, " ")
    .replace(/["\\<>]/g, "")
    .replace(/\s+/g, " ")
    .trim();
  if (!name) return configured;
  const address = mailboxAddress(configured);
  return /[()[\]:;@,.]/.test(name) ? `"${name}" <${address}>` : `${name} <${address}>`;
}
