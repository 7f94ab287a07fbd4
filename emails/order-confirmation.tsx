import { Link } from "@react-email/components";
import { formatUsd } from "@/lib/checkout/money";
import type { OrderAmounts } from "@/lib/mail/order-receipt";
import type { OrderLineView, OrgFooter, ReceiptView } from "@/lib/mail/message-types";
import { ActionButton, AmountRows, H1, H2, Note, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";
import { styles } from "./_parts/theme";

export type OrderConfirmationProps = {
  org: OrgFooter;
  name: string;
  orderNumber: string;
  orderUrl: string;
  lines: OrderLineView[];
  method: "parcel" | "pickup" | "none";
  shipTo: string | null;
  amounts: OrderAmounts;
  receipt: ReceiptView;
  /** The climate band stored on the order (the one the catalog showed), in words. */
  band?: { label: string; basis: string } | null;
};

function amountRows({
  lines,
  amounts,
  method,
}: Pick<OrderConfirmationProps, "lines" | "amounts" | "method">) {
  const rows: { label: string; cents: number; strong?: boolean }[] = lines.map((line) => ({
    label: `${line.name} × ${line.quantity} (${formatUsd(line.unitPriceCents)} each)`,
    cents: line.unitPriceCents * line.quantity,
  }));
  if (lines.length > 0)
    rows.push({
      label: method === "pickup" ? "Local pickup" : "Shipping",
      cents: amounts.shippingCents,
    });
  if (amounts.taxCents > 0) rows.push({ label: "Sales tax", cents: amounts.taxCents });
  if (amounts.giftCents > 0) rows.push({ label: "Conservation gift", cents: amounts.giftCents });
  rows.push({ label: "Total paid", cents: amounts.totalCents, strong: true });
  return rows;
}

export function OrderConfirmationEmail(props: OrderConfirmationProps) {
  const { org, name, orderNumber, orderUrl, lines, method, shipTo, receipt } = props;
  const hasItems = lines.length > 0;
  return (
    <EmailLayout
      org={org}
      preview={
        hasItems
          ? `Order ${orderNumber} is in the workshop queue: ${formatUsd(props.amounts.totalCents)} paid.`
          : `Thank you for your gift of ${formatUsd(props.amounts.giftCents)}.`
      }
    >
      <H1>{hasItems ? `Order ${orderNumber} is in the workshop queue` : "Thank you for your gift"}</H1>
      <P>
        Thank you, {name}.{" "}
        {hasItems
          ? "Your payment came through and your houses are set aside for you."
          : "Your gift came through and goes straight to the care of injured and orphaned bats."}
      </P>
      <H2>{hasItems ? "What you ordered" : "Your gift"}</H2>
      <AmountRows caption="Order amounts" rows={amountRows(props)} />
      {hasItems && method === "parcel" && shipTo ? (
        <P>
          We will ship to: {shipTo}. You will hear from us with a tracking number when the parcel
          leaves.
        </P>
      ) : null}
      {hasItems && method === "pickup" ? (
        <P>
          You chose local pickup at {org.street}, {org.city}. We will e-mail you when your houses
          are ready.
        </P>
      ) : null}
      <H2>For your records</H2>
      <Note>
        {receipt.statements.map((statement) => (
          <Soft key={statement}>{statement}</Soft>
        ))}
      </Note>
      {hasItems && props.band ? (
        <P>
          Your summers: {props.band.label.toLowerCase()}, from {props.band.basis}. Your install
          guide, written for your houses and this band, follows in a separate e-mail.
        </P>
      ) : hasItems ? (
        <P>
          Your install guide, written for your houses and your summers, follows in a separate
          e-mail.
        </P>
      ) : null}
      <ActionButton href={orderUrl}>See your order</ActionButton>
      <Soft>
        Or paste this link into your browser:{" "}
        <Link href={orderUrl} style={styles.link}>
          {orderUrl}
        </Link>
      </Soft>
    </EmailLayout>
  );
}

export default OrderConfirmationEmail;
