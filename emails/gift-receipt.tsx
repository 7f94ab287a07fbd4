import type { OrgFooter, ReceiptView } from "@/lib/mail/message-types";
import { formatUsd } from "@/lib/checkout/money";
import { AmountRows, H1, H2, Note, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";

export type GiftReceiptProps = {
  org: OrgFooter;
  donorName: string;
  orderNumber: string;
  /** The day the gift was received, already formatted. */
  date: string;
  amountPaidCents: number;
  giftCents: number;
  receipt: ReceiptView;
  /** A tribute and a covered card fee, in words (lib/giving/dedication-words.ts); none for a plain gift. */
  extras?: string[];
};

/** The gift receipt of PRODUCT.md §6: the organization, the date, the amount and what was received in exchange. */
export function GiftReceiptEmail({
  org,
  donorName,
  orderNumber,
  date,
  amountPaidCents,
  giftCents,
  receipt,
  extras = [],
}: GiftReceiptProps) {
  return (
    <EmailLayout org={org} preview={`Receipt for your gift of ${formatUsd(giftCents)} on ${date}.`}>
      <H1>Receipt for your gift</H1>
      <P>Thank you, {donorName}. Your gift keeps our flight cages and night feedings going.</P>
      <H2>Received by</H2>
      <P>
        {org.legalName}
        <br />
        {org.street}, {org.city}, {org.state} {org.zip}
        <br />
        Federal tax id (EIN): {org.taxId}
      </P>
      <H2>Your gift</H2>
      <P>
        Donor: {donorName}
        <br />
        Date received: {date}
        <br />
        Reference: order {orderNumber}
      </P>
      <AmountRows
        caption="Gift amounts"
        rows={
          receipt.kind === "gift"
            ? [{ label: "Gift", cents: giftCents, strong: true }]
            : [
                { label: "Amount paid", cents: amountPaidCents },
                { label: "Of which your gift", cents: giftCents, strong: true },
              ]
        }
      />
      {extras.map((line) => (
        <P key={line}>{line}</P>
      ))}
      <Note>
        {receipt.statements.map((statement) => (
          <Soft key={statement}>{statement}</Soft>
        ))}
      </Note>
      <Soft>
        Please keep this receipt with your tax records. We are happy to answer questions about it at{" "}
        {org.email}.
      </Soft>
    </EmailLayout>
  );
}

export default GiftReceiptEmail;
