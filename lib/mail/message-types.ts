// Shapes the e-mail templates (emails/) take as props: plain values, already loaded and
// formatted by lib/mail/compose-*.ts, so a template only lays things out.

/** The center's details, printed at the foot of every message and on receipts. */
export type OrgFooter = {
  displayName: string;
  legalName: string;
  street: string;
  city: string;
  state: string;
  zip: string;
  taxId: string;
  email: string;
  phone: string;
};

export type OrderLineView = { name: string; quantity: number; unitPriceCents: number };

export type ReceiptView = {
  kind: "gift" | "mixed" | "purchase";
  statements: string[];
  disclosureRequired: boolean;
  acknowledgmentRequired: boolean;
};
