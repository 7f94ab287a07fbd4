import { Link } from "@react-email/components";
import type { OrgFooter } from "@/lib/mail/message-types";
import { ActionButton, Bullets, H1, H2, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";
import { styles } from "./_parts/theme";

export type ShippedParcelView = {
  description: string;
  carrier: string;
  service: string | null;
  trackingNumber: string | null;
  trackingUrl: string | null;
};

export type ShippedProps = {
  org: OrgFooter;
  name: string;
  orderNumber: string;
  orderUrl: string;
  parcels: ShippedParcelView[];
};

export function ShippedEmail({ org, name, orderNumber, orderUrl, parcels }: ShippedProps) {
  return (
    <EmailLayout
      org={org}
      preview={`Order ${orderNumber} is with the carrier${parcels.length > 1 ? ` in ${parcels.length} parcels` : ""}.`}
    >
      <H1>Order {orderNumber} is with the carrier</H1>
      <P>Hello {name}. Your houses have left our workshop.</P>
      <H2>{parcels.length === 1 ? "Your parcel" : "Your parcels"}</H2>
      <Bullets
        items={parcels.map((parcel) => (
          <>
            {parcel.description}: {parcel.carrier}
            {parcel.service ? ` ${parcel.service}` : ""}
            {parcel.trackingNumber ? (
              <>
                , tracking number{" "}
                {parcel.trackingUrl ? (
                  <Link href={parcel.trackingUrl} style={styles.link}>
                    {parcel.trackingNumber}
                  </Link>
                ) : (
                  parcel.trackingNumber
                )}
              </>
            ) : null}
          </>
        ))}
      />
      <P>
        While it travels, pick the spot: your install guide says how high, which way to face and how
        much sun your summers call for.
      </P>
      <ActionButton href={orderUrl}>Follow your order</ActionButton>
      <Soft>
        Each house travels in its own carton; open them on a flat surface and keep the hardware bag.
      </Soft>
    </EmailLayout>
  );
}

export default ShippedEmail;
