import { Link } from "@react-email/components";
import type { OrgFooter } from "@/lib/mail/message-types";
import type { Caution } from "@/lib/safety/cautions";
import { ActionButton, Bullets, CautionList, H1, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";
import { styles } from "./_parts/theme";

export type RoostReportAdviceProps = {
  org: OrgFooter;
  name: string;
  houseTitles: string[];
  advice: string[];
  plannerUrl: string;
  orderUrl: string;
  stopUrl: string;
  cautions: readonly Caution[];
};

export function RoostReportAdviceEmail({ org, name, houseTitles, advice, plannerUrl, orderUrl, stopUrl, cautions }: RoostReportAdviceProps) {
  const one = houseTitles.length === 1;
  return (
    <EmailLayout
      org={org}
      preview="Two summers without bats is common. Here is what most often helps."
      footerNote={
        <>
          You told us your house was still empty.{" "}
          {/* No punctuation right after a link: in plain text a mail program would take it into the address. */}
          <Link href={stopUrl} style={styles.link}>
            Stop these messages
          </Link>{" "}
          at any time.
        </>
      }
    >
      <H1>Still waiting for bats?</H1>
      <P>
        Hello {name}. Thank you for telling us that {one ? "your house is" : "your houses are"} still empty after two summers (
        {houseTitles.join(", ")}). That is common, and it is not the end: bats may take up to two years to find a house, and a change of
        spot often makes the difference.
      </P>
      <Bullets items={advice} />
      <ActionButton href={plannerUrl}>Check a new spot in the site planner</ActionButton>
      <P>
        When bats do move in, tell us on{" "}
        <Link href={orderUrl} style={styles.link}>
          your order page
        </Link>{" "}
        whenever you see them.
      </P>
      <CautionList cautions={cautions} />
      <Soft>Moving a house means a ladder and perhaps a new pole: read the cautions above first.</Soft>
    </EmailLayout>
  );
}

export default RoostReportAdviceEmail;
