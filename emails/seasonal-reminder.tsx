import { Link } from "@react-email/components";
import type { OrgFooter } from "@/lib/mail/message-types";
import type { Caution } from "@/lib/safety/cautions";
import type { UpkeepSeason } from "@/lib/mail/upkeep-calendar";
import { Bullets, CautionList, H1, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";
import { styles } from "./_parts/theme";

export type SeasonalReminderProps = {
  org: OrgFooter;
  name: string;
  season: UpkeepSeason;
  cautions: readonly Caution[];
  patience: { title: string; text: string } | null;
  preferencesUrl: string;
  unsubscribeUrl: string;
};

export function SeasonalReminderEmail({
  org,
  name,
  season,
  cautions,
  patience,
  preferencesUrl,
  unsubscribeUrl,
}: SeasonalReminderProps) {
  return (
    <EmailLayout
      org={org}
      preview={`${season.title}: ${season.summary}`}
      footerNote={
        <>
          You get these reminders because you asked for them.{" "}
          <Link href={unsubscribeUrl} style={styles.link}>
            Stop seasonal reminders
          </Link>{" "}
          with one click, or change them in{" "}
          <Link href={preferencesUrl} style={styles.link}>
            your e-mail preferences
          </Link>
          .
        </>
      }
    >
      <H1>
        {season.title}: {season.months}
      </H1>
      <P>
        Hello {name}. {season.summary}
      </P>
      <Bullets items={season.tasks} />
      {patience ? (
        <>
          <P>
            <strong>{patience.title}.</strong> {patience.text}
          </P>
        </>
      ) : null}
      <CautionList cautions={cautions} />
      <Soft>
        These are general notes; your install guide has the advice for your own house and summers.
      </Soft>
    </EmailLayout>
  );
}

export default SeasonalReminderEmail;
