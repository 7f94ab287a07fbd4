"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { ConfirmDialog } from "@/components/ui/dialog";
import { Field } from "@/components/ui/field";
import { FormError } from "@/components/ui/form-error";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { Textarea } from "@/components/ui/textarea";
import { formatUsd } from "@/lib/checkout/money";
import { refundSchema, transitionSchema, type RefundInput, type TransitionInput } from "@/lib/fulfillment/schemas";
import { ORDER_STATUS_LABELS, type FulfillmentState } from "@/lib/orders/statuses";
import { ConflictNotice } from "./conflict-notice";
import { useOrderAction } from "./use-order-action";

type Props = {
  orderId: string;
  version: number;
  /** Where an admin's correction may take the order from here (one step back). */
  corrections: FulfillmentState[];
  canCancel: boolean;
  canRefund: boolean;
  remainingCents: number;
};

/** Admin only: step back with a reason, cancel an order that has not left, refund one that has. */
export function AdminPanel({ orderId, version, corrections, canCancel, canRefund, remainingCents }: Props) {
  const action = useOrderAction();
  return (
    <Card as="section" aria-labelledby="admin-heading" className="flex flex-col gap-5">
      <div>
        <h2 id="admin-heading" className="text-xl">
          Admin corrections and refunds
        </h2>
        <p className="text-sm text-ink-soft">Every change here is kept in the order&apos;s history with your name and reason.</p>
      </div>
      <ConflictNotice message={action.conflict} onReload={action.reload} />
      <FormError message={action.error} />
      {corrections.length > 0 ? <CorrectionForm orderId={orderId} version={version} corrections={corrections} action={action} /> : null}
      {canCancel ? <CancelForm orderId={orderId} version={version} remainingCents={remainingCents} action={action} /> : null}
      {canRefund && remainingCents > 0 ? <RefundForm orderId={orderId} version={version} remainingCents={remainingCents} action={action} /> : null}
      {corrections.length === 0 && !canCancel && !(canRefund && remainingCents > 0) ? (
        <p className="text-ink-soft">Nothing to correct or refund from this state.</p>
      ) : null}
    </Card>
  );
}

type Action = ReturnType<typeof useOrderAction>;

function CorrectionForm({ orderId, version, corrections, action }: { orderId: string; version: number; corrections: FulfillmentState[]; action: Action }) {
  const form = useForm<TransitionInput>({ resolver: zodResolver(transitionSchema), defaultValues: { version, to: corrections[0], reason: "" } });
  return (
    <form
      aria-label="Step the order back"
      noValidate
      className="flex flex-col gap-3 border-t border-paper-200 pt-4"
      onSubmit={form.handleSubmit(async (input) => {
        const result = await action.run(`/api/fulfillment/orders/${orderId}/transition`, input, "The order went back a step.");
        if (!result.ok && result.fields?.reason) form.setError("reason", { message: result.fields.reason });
      })}
    >
      <h3 className="text-lg">Step back</h3>
      <Field label="Back to">
        <Select {...form.register("to")}>
          {corrections.map((s) => (
            <option key={s} value={s}>
              {ORDER_STATUS_LABELS[s].label}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Why" required error={form.formState.errors.reason?.message}>
        <Textarea rows={2} {...form.register("reason")} />
      </Field>
      <Button type="submit" variant="secondary" loading={action.pending} className="self-start">
        Step back
      </Button>
    </form>
  );
}

const reasonOnly = refundSchema.pick({ version: true, reason: true });

function CancelForm({ orderId, version, remainingCents, action }: { orderId: string; version: number; remainingCents: number; action: Action }) {
  const [confirming, setConfirming] = useState(false);
  const form = useForm<{ version: number; reason: string }>({ resolver: zodResolver(reasonOnly), defaultValues: { version, reason: "" } });
  return (
    <form aria-label="Cancel the order" noValidate className="flex flex-col gap-3 border-t border-paper-200 pt-4" onSubmit={form.handleSubmit(() => setConfirming(true))}>
      <h3 className="text-lg">Cancel and refund</h3>
      <p className="text-sm text-ink-soft">The order has not left the center: the buyer gets {formatUsd(remainingCents)} back and the houses return to stock.</p>
      <Field label="Reason for cancelling" required error={form.formState.errors.reason?.message}>
        <Textarea rows={2} {...form.register("reason")} />
      </Field>
      <Button type="submit" variant="danger" className="self-start">
        Cancel order…
      </Button>
      <ConfirmDialog
        open={confirming}
        title="Cancel this order?"
        confirmLabel={`Cancel and refund ${formatUsd(remainingCents)}`}
        cancelLabel="Keep the order"
        pending={action.pending}
        onCancel={() => setConfirming(false)}
        onConfirm={async () => {
          await action.run(`/api/fulfillment/orders/${orderId}/cancel`, form.getValues(), "Order cancelled and refunded.");
          setConfirming(false);
        }}
      >
        The payment of {formatUsd(remainingCents)} goes back to the buyer&apos;s card and the houses go back on the shelf. This
        cannot be undone.
      </ConfirmDialog>
    </form>
  );
}

function RefundForm({ orderId, version, remainingCents, action }: { orderId: string; version: number; remainingCents: number; action: Action }) {
  const [confirming, setConfirming] = useState(false);
  const form = useForm<RefundInput>({ resolver: zodResolver(refundSchema), defaultValues: { version, amount: "", reason: "" } });
  const amount = useWatch({ control: form.control, name: "amount" });
  const what = amount ? `$${amount}` : `the remaining ${formatUsd(remainingCents)}`;
  return (
    <form aria-label="Refund the order" noValidate className="flex flex-col gap-3 border-t border-paper-200 pt-4" onSubmit={form.handleSubmit(() => setConfirming(true))}>
      <h3 className="text-lg">Refund</h3>
      <p className="text-sm text-ink-soft">The houses have left: stock stays as it is. Up to {formatUsd(remainingCents)} can be refunded.</p>
      <Field label="Amount in dollars" hint="Leave blank to refund everything not yet refunded." error={form.formState.errors.amount?.message}>
        <Input inputMode="decimal" className="max-w-40" {...form.register("amount")} />
      </Field>
      <Field label="Reason for the refund" required error={form.formState.errors.reason?.message}>
        <Textarea rows={2} {...form.register("reason")} />
      </Field>
      <Button type="submit" variant="danger" className="self-start">
        Refund…
      </Button>
      <ConfirmDialog
        open={confirming}
        title="Refund this order?"
        confirmLabel={`Refund ${what}`}
        cancelLabel="Don't refund"
        pending={action.pending}
        onCancel={() => setConfirming(false)}
        onConfirm={async () => {
          await action.run(`/api/fulfillment/orders/${orderId}/refund`, form.getValues(), "Refund sent.");
          setConfirming(false);
        }}
      >
        {what} goes back to the buyer&apos;s card. The order keeps its state, and this cannot be undone.
      </ConfirmDialog>
    </form>
  );
}
