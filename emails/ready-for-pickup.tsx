import type { OrgFooter } from "@/lib/mail/message-types";
import { ActionButton, H1, H2, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";

export type ReadyForPickupProps = {
  org: OrgFooter;
  name: string;
  orderNumber: string;
  orderUrl: string;
};

export function ReadyForPickupEmail({ org, name, orderNumber, orderUrl }: ReadyForPickupProps) {
  return (
    <EmailLayout org={org} preview={`Order ${orderNumber} is waiting at the center.`}>
      <H1>Order {orderNumber} is waiting at the center</H1>
      <P>Hello {name}. Your houses are packed and waiting for you at the center.</P>
      <H2>Where</H2>
      <P>
        {org.displayName}
        <br />
        {org.street}, {org.city}, {org.state} {org.zip}
        <br />
        {org.phone}
      </P>
      <P>
        Bring your order number ({orderNumber}). A house is about the size of a small suitcase; a
        car&apos;s back seat fits two.
      </P>
      <ActionButton href={orderUrl}>See your order</ActionButton>
      <Soft>
        Call ahead if you are coming outside opening hours; animal care sometimes keeps everyone
        busy.
      </Soft>
    </EmailLayout>
  );
}

export default ReadyForPickupEmail;
