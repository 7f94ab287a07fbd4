import { formatUsd } from "@/lib/checkout/money";
import type { OrgFooter } from "@/lib/mail/message-types";
import { ActionButton, H1, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";

export type PaymentRefundedProps = {
  org: OrgFooter;
  name: string;
  orderNumber: string;
  why: string;
  amountCents: number;
  shopUrl: string;
};

/** A payment that could not be used (the houses sold out while it was on its way) was returned in full. */
export function PaymentRefundedEmail({
  org,
  name,
  orderNumber,
  why,
  amountCents,
  shopUrl,
}: PaymentRefundedProps) {
  return (
    <EmailLayout
      org={org}
      preview={`We returned your payment of ${formatUsd(amountCents)} for order ${orderNumber}.`}
    >
      <H1>We returned your payment for order {orderNumber}</H1>
      <P>
        Hello {name}. Your payment of {formatUsd(amountCents)} arrived, but we could not fill the
        order: {why}. We refunded it in full at once; banks usually take 5 to 10 business days to
        show it.
      </P>
      <P>
        We are sorry. Our volunteers build new houses every month; the catalog shows what is in
        stock today.
      </P>
      <ActionButton href={shopUrl}>See the houses in stock</ActionButton>
      <Soft>Nothing else is needed from you. Reply to this e-mail with any question.</Soft>
    </EmailLayout>
  );
}

export default PaymentRefundedEmail;
