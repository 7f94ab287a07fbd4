import { formatUsd } from "@/lib/checkout/money";
import type { OrgFooter } from "@/lib/mail/message-types";
import { H1, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";

export type TributeNoticeProps = {
  org: OrgFooter;
  noticeName: string;
  donorName: string;
  kind: "honor" | "memory";
  tributeName: string;
  /** Only when the donor chose to say it. */
  amountCents: number | null;
};

export function TributeNoticeEmail({ org, noticeName, donorName, kind, tributeName, amountCents }: TributeNoticeProps) {
  const words = kind === "memory" ? "in memory of" : "in honour of";
  return (
    <EmailLayout org={org} preview={`${donorName} made a gift ${words} ${tributeName}.`}>
      <H1>
        A gift {words} {tributeName}
      </H1>
      <P>
        Dear {noticeName}, {donorName} has made a gift to {org.displayName} {words} {tributeName}
        {amountCents !== null ? ` of ${formatUsd(amountCents)}` : ""}. It helps care for injured and orphaned bats until they can fly free again.
      </P>
      <Soft>{donorName} asked us to let you know. We will not write to you again unless you ask us to.</Soft>
    </EmailLayout>
  );
}

export default TributeNoticeEmail;
