"use client";

import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { FormError } from "@/components/ui/form-error";
import type { BoxDraft } from "@/lib/fulfillment/packing";
import type { FulfillmentState } from "@/lib/orders/statuses";
import { ConflictNotice } from "./conflict-notice";
import { PackForm } from "./pack-form";
import type { NextStepBox } from "./ship-box";
import { ShipBoxForm } from "./ship-box-form";
import { useOrderAction } from "./use-order-action";

type Props = {
  orderId: string;
  status: FulfillmentState;
  method: "parcel" | "pickup";
  version: number;
  boxes: NextStepBox[];
  defaultBoxes: BoxDraft[];
};

// The one forward step each state offers, in our words, with what it sets off for the buyer.
const STEPS: Partial<Record<FulfillmentState, { to: FulfillmentState; label: string; hint: string; done: string }>> = {
  paid: { to: "packing", label: "Start packing", hint: "Tells the other volunteers this order is on your bench.", done: "Packing started." },
  shipped: {
    to: "delivered",
    label: "Log the arrival",
    hint: "When the carrier's page says every box arrived. The buyer gets a note and their install guide.",
    done: "Arrival logged; the install guide is going out to the buyer.",
  },
  ready_for_pickup: { to: "picked_up", label: "Log the handover", hint: "When the buyer has taken the house home.", done: "Handover logged." },
};

/** What to do with the order now: one button, the packing form, or a shipping form per box. */
export function NextStep({ orderId, status, method, version, boxes, defaultBoxes }: Props) {
  const action = useOrderAction();
  const step = (to: FulfillmentState, done: string) =>
    action.run(`/api/fulfillment/orders/${orderId}/transition`, { version, to }, done);

  let body: React.ReactNode;
  const simple = STEPS[status];
  if (simple) {
    body = (
      <div className="flex flex-col items-start gap-2">
        <p className="text-ink-soft">{simple.hint}</p>
        <Button onClick={() => step(simple.to, simple.done)} loading={action.pending}>
          {simple.label}
        </Button>
      </div>
    );
  } else if (status === "packing" && method === "pickup") {
    body = (
      <div className="flex flex-col items-start gap-2">
        <p className="text-ink-soft">Put the house on the pickup shelf with the slip taped to it. The buyer gets an e-mail that it is ready.</p>
        <Button onClick={() => step("ready_for_pickup", "Ready at the front desk; the buyer has been told.")} loading={action.pending}>
          Ready at the front desk
        </Button>
      </div>
    );
  } else if (status === "packing") {
    body = <PackForm orderId={orderId} version={version} defaultBoxes={defaultBoxes} action={action} />;
  } else if (status === "packed") {
    const waiting = boxes.filter((b) => !b.tracked);
    body =
      waiting.length > 0 ? (
        <div className="flex flex-col gap-6">
          <p className="text-ink-soft">
            Scan or type each box&apos;s tracking number as it goes on the carrier&apos;s truck. The order counts as shipped, and the
            buyer gets an e-mail, when the last box has its number. {boxes.length - waiting.length} of {boxes.length} done.
          </p>
          {waiting.map((box) => (
            <ShipBoxForm key={box.id} orderId={orderId} version={version} box={box} position={boxes.indexOf(box) + 1} action={action} />
          ))}
        </div>
      ) : (
        <div className="flex flex-col items-start gap-2">
          <p className="text-ink-soft">Every box has a tracking number.</p>
          <Button onClick={() => step("shipped", "With the carrier; the buyer has been told.")} loading={action.pending}>
            Hand to the carrier
          </Button>
        </div>
      );
  } else {
    body = <p className="text-ink-soft">Nothing left to do at the shipping desk for this order.</p>;
  }

  return (
    <Card as="section" aria-labelledby="next-step-heading" className="flex flex-col gap-4">
      <h2 id="next-step-heading" className="text-xl">
        What to do now
      </h2>
      <ConflictNotice message={action.conflict} onReload={action.reload} />
      <FormError message={action.error} />
      {body}
    </Card>
  );
}
