import {
  Body,
  Container,
  Head,
  Hr,
  Html,
  Link,
  Preview,
  Section,
  Text,
} from "@react-email/components";
import type { ReactNode } from "react";
import type { OrgFooter } from "@/lib/mail/message-types";
import { styles } from "./theme";

/** The frame every message shares: masthead, one column of content, the center's footer. */
export function EmailLayout({
  preview,
  org,
  children,
  footerNote,
}: {
  preview: string;
  org: OrgFooter;
  children: ReactNode;
  /** Why this person gets this message, or how to stop it. */
  footerNote?: ReactNode;
}) {
  return (
    <Html lang="en">
      <Head />
      <Preview>{preview}</Preview>
      <Body style={styles.body}>
        <Container style={styles.container}>
          <Section style={styles.masthead}>
            <Text style={styles.mastheadText}>{org.displayName}</Text>
            <Text style={styles.mastheadSub}>Roost houses built and checked by our volunteers</Text>
          </Section>
          <Section style={styles.content}>{children}</Section>
          <Hr style={styles.hr} />
          {footerNote ? <Text style={styles.footer}>{footerNote}</Text> : null}
          <Text style={styles.footer}>
            {org.legalName} · {org.street}, {org.city}, {org.state} {org.zip} · {org.phone} ·{" "}
            <Link href={`mailto:${org.email}`} style={styles.link}>
              {org.email}
            </Link>
          </Text>
        </Container>
      </Body>
    </Html>
  );
}
