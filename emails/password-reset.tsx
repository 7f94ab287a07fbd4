import { Link } from "@react-email/components";
import type { OrgFooter } from "@/lib/mail/message-types";
import { ActionButton, H1, P, Soft } from "./_parts/blocks";
import { EmailLayout } from "./_parts/layout";
import { styles } from "./_parts/theme";

export type PasswordResetProps = {
  org: OrgFooter;
  name: string;
  resetUrl: string;
  validMinutes: number;
};

export function PasswordResetEmail({ org, name, resetUrl, validMinutes }: PasswordResetProps) {
  return (
    <EmailLayout
      org={org}
      preview={`Choose a new password; the link works once, for ${validMinutes} minutes.`}
    >
      <H1>Choose a new password</H1>
      <P>
        Hello {name}. Someone, probably you, asked to reset the password of your account. Use the
        button to choose a new one.
      </P>
      <ActionButton href={resetUrl}>Choose a new password</ActionButton>
      <Soft>
        The link works once and only for the next {validMinutes} minutes. Or paste it into your
        browser:{" "}
        <Link href={resetUrl} style={styles.link}>
          {resetUrl}
        </Link>
      </Soft>
      <P>If you did not ask for this, ignore this e-mail: your password stays as it is.</P>
    </EmailLayout>
  );
}

export default PasswordResetEmail;
