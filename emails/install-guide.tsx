import { Link, Section, Text } from "@react-email/components";
import type { GuideItem, InstallGuide } from "@/lib/mail/install-guide-content";
import type { OrgFooter } from "@/lib/mail/message-types";
import { ActionButton, Bullets, CautionList, H1, H2, H3, Note, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";
import { styles } from "./_parts/theme";

export type InstallGuideProps = {
  org: OrgFooter;
  name: string;
  orderNumber: string;
  orderUrl: string;
  occasion: "paid" | "delivered";
  pickup: boolean;
  guide: InstallGuide;
  preferencesUrl: string;
};

function Items({ items }: { items: readonly GuideItem[] }) {
  return (
    <Bullets
      items={items.map((item) => (
        <>
          <strong>{item.topic}:</strong> {item.text}
        </>
      ))}
    />
  );
}

function intro({
  occasion,
  pickup,
  count,
}: Pick<InstallGuideProps, "occasion" | "pickup"> & { count: number }): string {
  const houses = count === 1 ? "Your house has" : "Your houses have";
  if (occasion === "delivered") {
    return `${houses} reached you. Here is your install guide again, so it is at hand when you mount ${count === 1 ? "it" : "them"}.`;
  }
  if (pickup) {
    return `${count === 1 ? "Your house will be" : "Your houses will be"} waiting at the center soon. Read this first, so the pole or wall and the spot are ready when you bring ${count === 1 ? "it" : "them"} home.`;
  }
  return `${count === 1 ? "Your house is" : "Your houses are"} on the way. Read this before ${count === 1 ? "it arrives" : "they arrive"}, so the pole or wall and the spot are ready.`;
}

export function InstallGuideEmail(props: InstallGuideProps) {
  const { org, name, orderNumber, orderUrl, guide, preferencesUrl } = props;
  const count = guide.houses.reduce((sum, house) => sum + house.quantity, 0);
  return (
    <EmailLayout
      org={org}
      preview={`Where and how to mount your ${count === 1 ? "house" : "houses"}, and how to care for ${count === 1 ? "it" : "them"} year round.`}
      footerNote={
        <>
          Want a short reminder each season (winter check, spring return, maternity-season quiet
          time)? Turn it on in{" "}
          <Link href={preferencesUrl} style={styles.link}>
            your e-mail preferences
          </Link>
          .
        </>
      }
    >
      <H1>Your install guide, order {orderNumber}</H1>
      <P>
        Hello {name}. {intro({ ...props, count })}
      </P>
      <Soft>Read the safety notes at the end before anyone climbs, digs or mounts anything.</Soft>

      <H2>{guide.climate.heading}</H2>
      {guide.climate.paragraphs.map((paragraph) => (
        <P key={paragraph}>{paragraph}</P>
      ))}
      {guide.climate.advice.length > 0 ? <Items items={guide.climate.advice} /> : null}

      {guide.site ? (
        <>
          <H2>{guide.site.heading}</H2>
          <P>{guide.site.summary}</P>
          {guide.site.toChange.length > 0 ? <Items items={guide.site.toChange} /> : null}
          <P>{guide.site.skyline}</P>
        </>
      ) : null}

      <H2>Where and how to mount</H2>
      <Items items={guide.mounting} />

      <H2>{count === 1 ? "Your house" : "Your houses"}</H2>
      {guide.houses.map((house) => (
        <Section key={house.name}>
          <H3>
            {house.name}
            {house.quantity > 1 ? ` × ${house.quantity}` : ""}
          </H3>
          {house.fit ? (
            <Note tone={house.fit.label}>
              <Text style={{ ...styles.p, fontWeight: 700, margin: "0 0 4px" }}>
                {house.fit.words}
              </Text>
              {house.fit.reasons.map((reason) => (
                <Soft key={reason}>{reason}</Soft>
              ))}
            </Note>
          ) : null}
          <Items items={house.notes} />
        </Section>
      ))}

      <H2>Care through the year</H2>
      {guide.calendar.map((season) => (
        <Section key={season.id}>
          <H3>
            {season.title} ({season.months})
          </H3>
          <P>{season.summary}</P>
          <Bullets items={season.tasks} />
        </Section>
      ))}

      <H2>{guide.patience.title}</H2>
      <P>{guide.patience.text}</P>

      <CautionList cautions={guide.cautions} />

      <ActionButton href={orderUrl}>See your order</ActionButton>
    </EmailLayout>
  );
}

export default InstallGuideEmail;
