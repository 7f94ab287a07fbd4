import { formatUsd } from "@/lib/checkout/money";
import type { OrgFooter } from "@/lib/mail/message-types";
import { ActionButton, H1, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";

export type MonthlyGiftChangedProps = { org: OrgFooter; donorName: string; change: "amount" | "stopped"; amountCents: number; manageUrl: string };

export function MonthlyGiftChangedEmail({ org, donorName, change, amountCents, manageUrl }: MonthlyGiftChangedProps) {
  const stopped = change === "stopped";
  return (
    <EmailLayout org={org} preview={stopped ? "Your monthly gift is stopped." : `Your monthly gift is now ${formatUsd(amountCents)}.`}>
      <H1>{stopped ? "Your monthly gift is stopped" : "Your monthly gift's new amount"}</H1>
      {stopped ? (
        <P>
          Hello {donorName}, as you asked, your monthly gift of {formatUsd(amountCents)} to {org.displayName} is stopped. No further payment
          will be taken. Thank you for every month you gave.
        </P>
      ) : (
        <P>
          Hello {donorName}, your monthly gift to {org.displayName} is now {formatUsd(amountCents)} a month, from the next payment on.
        </P>
      )}
      <ActionButton href={manageUrl}>{stopped ? "See your monthly gift" : "Change or stop it"}</ActionButton>
      <Soft>Every payment gets its own receipt. If you did not ask for this change, reply to this message.</Soft>
    </EmailLayout>
  );
}

export default MonthlyGiftChangedEmail;
