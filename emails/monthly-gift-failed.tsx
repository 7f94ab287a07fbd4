import { formatUsd } from "@/lib/checkout/money";
import type { OrgFooter } from "@/lib/mail/message-types";
import { ActionButton, H1, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";

export type MonthlyGiftFailedProps = { org: OrgFooter; donorName: string; amountCents: number; manageUrl: string };

export function MonthlyGiftFailedEmail({ org, donorName, amountCents, manageUrl }: MonthlyGiftFailedProps) {
  return (
    <EmailLayout org={org} preview={`This month's gift of ${formatUsd(amountCents)} did not go through.`}>
      <H1>This month&apos;s gift did not go through</H1>
      <P>
        Hello {donorName}, your card was declined for this month&apos;s gift of {formatUsd(amountCents)} to {org.displayName}. Nothing
        was charged.
      </P>
      <P>If you would like to keep giving monthly, you can pay this month with another card. The same page lets you change the amount or stop.</P>
      <ActionButton href={manageUrl}>Update your card</ActionButton>
      <Soft>This link is private to your monthly gift; no sign-in is needed. If you do nothing, no further attempt is charged until you choose.</Soft>
    </EmailLayout>
  );
}

export default MonthlyGiftFailedEmail;
