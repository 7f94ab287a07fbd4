import type { OrgFooter } from "@/lib/mail/message-types";
import { ActionButton, H1, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";

export type LowStockProps = {
  org: OrgFooter;
  staffName: string;
  modelName: string;
  stock: number;
  threshold: number;
  modelUrl: string;
};

export function LowStockEmail({
  org,
  staffName,
  modelName,
  stock,
  threshold,
  modelUrl,
}: LowStockProps) {
  return (
    <EmailLayout
      org={org}
      preview={`${modelName}: ${stock} left, under the low-stock mark of ${threshold}.`}
      footerNote="You get this because you are on the workshop staff."
    >
      <H1>{modelName} is running low</H1>
      <P>
        Hello {staffName}. {modelName} has {stock} {stock === 1 ? "house" : "houses"} on the shelf,
        under its low-stock mark of {threshold}. Time to plan the next batch with the builders.
      </P>
      <ActionButton href={modelUrl}>Open the model</ActionButton>
      <Soft>
        Units held for unpaid carts count as off the shelf; some may come back if those carts
        expire.
      </Soft>
    </EmailLayout>
  );
}

export default LowStockEmail;
