import { formatUsd } from "@/lib/checkout/money";
import type { OrgFooter } from "@/lib/mail/message-types";
import { AmountRows, H1, H2, Note, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";

export type YearEndStatementProps = {
  org: OrgFooter;
  donorName: string;
  year: number;
  issuedOn: string;
  gifts: { date: string; orderNumber: string; amountCents: number }[];
  totalCents: number;
  statements: string[];
  /** The center's time zone, whose calendar dates the gifts. */
  timeZone?: string;
};

export function YearEndStatementEmail({
  org,
  donorName,
  year,
  issuedOn,
  gifts,
  totalCents,
  statements,
  timeZone = "UTC",
}: YearEndStatementProps) {
  return (
    <EmailLayout org={org} preview={`Your gifts in ${year}: ${formatUsd(totalCents)} in all.`}>
      <H1>Your gifts in {year}</H1>
      <P>
        Thank you, {donorName}. Here is the statement of your gifts to {org.legalName} (EIN{" "}
        {org.taxId}) in the calendar year {year}, issued on {issuedOn}.
      </P>
      <H2>Gifts</H2>
      {gifts.length > 0 ? (
        <AmountRows
          caption={`Gifts in ${year}`}
          rows={[
            ...gifts.map((gift) => ({
              label: `${gift.date} · order ${gift.orderNumber}`,
              cents: gift.amountCents,
            })),
            { label: `Total for ${year}`, cents: totalCents, strong: true },
          ]}
        />
      ) : null}
      <Note>
        {statements.map((statement) => (
          <Soft key={statement}>{statement}</Soft>
        ))}
      </Note>
      <Soft>
        Dates and the year are the center&apos;s own calendar ({timeZone}), as on each gift&apos;s own receipt.
      </Soft>
    </EmailLayout>
  );
}

export default YearEndStatementEmail;
