import { Link, Section, Text } from "@react-email/components";
import type { OrgFooter } from "@/lib/mail/message-types";
import type { Caution } from "@/lib/safety/cautions";
import { CautionList, H1, H2, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";
import { styles } from "./_parts/theme";

export type AskHouse = {
  title: string;
  links: { label: string; href: string }[];
};

export type RoostReportAskProps = {
  org: OrgFooter;
  name: string;
  seasonLabel: string;
  houses: AskHouse[];
  orderUrl: string;
  stopUrl: string;
  cautions: readonly Caution[];
};

export function RoostReportAskEmail({ org, name, seasonLabel, houses, orderUrl, stopUrl, cautions }: RoostReportAskProps) {
  return (
    <EmailLayout
      org={org}
      preview={`One click tells us whether bats used your house in summer ${seasonLabel}.`}
      footerNote={
        <>
          We ask once after each summer, so the next buyer knows how houses like yours do.{" "}
          {/* No punctuation right after a link: in plain text a mail program would take it into the address. */}
          <Link href={stopUrl} style={styles.link}>
            Stop these questions
          </Link>{" "}
          at any time.
        </>
      }
    >
      <H1>Did bats move in this summer?</H1>
      <P>
        Hello {name}. The {seasonLabel} maternity season is over. Whatever you saw, even nothing at all, one click below helps: your answer
        goes into the figures we show buyers for each model. Look from the ground at dusk or by day: there is no need to open or touch the
        house.
      </P>
      <Soft>
        Signs of bats are droppings on the ground or wall below the house, or dark stains at the entrance. A click opens a page where you
        confirm; you can change your answer later by clicking another one.
      </Soft>
      {houses.map((house) => (
        <Section key={house.title} style={styles.caution}>
          <H2>{house.title}</H2>
          {house.links.map((link) => (
            <Text key={link.label} style={{ ...styles.p, margin: "0 0 6px" }}>
              <Link href={link.href} style={styles.link}>
                {link.label}
              </Link>
            </Text>
          ))}
        </Section>
      ))}
      <P>
        <Link href={orderUrl} style={styles.link}>
          Open your order page
        </Link>{" "}
        to add a note or a photo.
      </P>
      <CautionList cautions={cautions} />
    </EmailLayout>
  );
}

export default RoostReportAskEmail;
