import { formatUsd } from "@/lib/checkout/money";
import type { OrgFooter } from "@/lib/mail/message-types";
import { ActionButton, AmountRows, H1, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";

export type RefundProps = {
  org: OrgFooter;
  name: string;
  orderNumber: string;
  orderUrl: string;
  amountCents: number;
  cancelled: boolean;
  totalPaidCents: number;
  totalRefundedCents: number;
  hadGift: boolean;
};

export function RefundEmail({
  org,
  name,
  orderNumber,
  orderUrl,
  amountCents,
  cancelled,
  totalPaidCents,
  totalRefundedCents,
  hadGift,
}: RefundProps) {
  return (
    <EmailLayout
      org={org}
      preview={`We refunded ${formatUsd(amountCents)} for order ${orderNumber}.`}
    >
      <H1>
        {cancelled
          ? `Order ${orderNumber} is cancelled and refunded`
          : `A refund for order ${orderNumber}`}
      </H1>
      <P>
        Hello {name}. We have refunded {formatUsd(amountCents)} to the card you paid with. Banks
        usually take 5 to 10 business days to show it.
      </P>
      <AmountRows
        caption="Refund amounts"
        rows={[
          { label: "Paid for the order", cents: totalPaidCents },
          { label: "This refund", cents: amountCents },
          { label: "Refunded in all", cents: totalRefundedCents, strong: true },
        ]}
      />
      {hadGift ? (
        <P>
          If this refund includes part of your gift, that part no longer counts as a contribution;
          keep this e-mail with your gift receipt.
        </P>
      ) : null}
      <ActionButton href={orderUrl}>See your order</ActionButton>
      <Soft>Questions about this refund? Reply to this e-mail.</Soft>
    </EmailLayout>
  );
}

export default RefundEmail;
