import type { OrgFooter } from "@/lib/mail/message-types";
import { ActionButton, H1, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";

export type DeliveredProps = {
  org: OrgFooter;
  name: string;
  orderNumber: string;
  orderUrl: string;
};

export function DeliveredEmail({ org, name, orderNumber, orderUrl }: DeliveredProps) {
  return (
    <EmailLayout org={org} preview={`Order ${orderNumber} is at your door.`}>
      <H1>Order {orderNumber} is at your door</H1>
      <P>
        Hello {name}. The carrier reports your parcel delivered. Your install guide follows in a
        separate e-mail, so you have it at hand for mounting.
      </P>
      <P>
        If a carton arrived damaged or a house is missing a part, reply to this e-mail with a photo
        and we will put it right.
      </P>
      <ActionButton href={orderUrl}>See your order</ActionButton>
      <Soft>Not received it? Check with neighbours and around the door first, then tell us.</Soft>
    </EmailLayout>
  );
}

export default DeliveredEmail;
