import { Button, Heading, Section, Text } from "@react-email/components";
import type { ReactNode } from "react";
import { formatUsd } from "@/lib/checkout/money";
import type { Caution } from "@/lib/safety/cautions";
import { styles } from "./theme";

export function H1({ children }: { children: ReactNode }) {
  return (
    <Heading as="h1" style={styles.h1}>
      {children}
    </Heading>
  );
}

export function H2({ children }: { children: ReactNode }) {
  return (
    <Heading as="h2" style={styles.h2}>
      {children}
    </Heading>
  );
}

export function H3({ children }: { children: ReactNode }) {
  return (
    <Heading as="h3" style={styles.h3}>
      {children}
    </Heading>
  );
}

export function P({ children }: { children: ReactNode }) {
  return <Text style={styles.p}>{children}</Text>;
}

export function Soft({ children }: { children: ReactNode }) {
  return <Text style={styles.soft}>{children}</Text>;
}

export function ActionButton({ href, children }: { href: string; children: ReactNode }) {
  return (
    <Section style={{ margin: "8px 0 16px" }}>
      <Button href={href} style={styles.button}>
        {children}
      </Button>
    </Section>
  );
}

/** A list as separate paragraphs with a bullet: lists render unevenly across mail programs. */
export function Bullets({ items }: { items: readonly ReactNode[] }) {
  return (
    <Section style={{ margin: "0 0 8px" }}>
      {items.map((item, i) => (
        <Text
          key={i}
          style={{ ...styles.p, margin: "0 0 6px", paddingLeft: "16px", textIndent: "-12px" }}
        >
          •&nbsp; {item}
        </Text>
      ))}
    </Section>
  );
}

const NOTE_STYLES = { good: styles.note, fair: styles.noteFair, poor: styles.notePoor } as const;

/** A tinted box; the tone follows the fit labels (good moss, fair ember, poor berry). */
export function Note({
  children,
  tone = "good",
}: {
  children: ReactNode;
  tone?: keyof typeof NOTE_STYLES;
}) {
  return <Section style={NOTE_STYLES[tone]}>{children}</Section>;
}

/** Label–amount rows, the last one (the total) in bold. */
export function AmountRows({
  rows,
  caption,
}: {
  rows: readonly { label: string; cents: number; strong?: boolean }[];
  caption: string;
}) {
  return (
    <table
      className="amounts"
      role="presentation"
      width="100%"
      cellPadding={0}
      cellSpacing={0}
      aria-label={caption}
      style={{ borderCollapse: "collapse", margin: "4px 0 16px" }}
    >
      <tbody>
        {rows.map((row) => (
          <tr key={row.label}>
            <td style={{ ...styles.cell, fontWeight: row.strong ? 700 : 400 }}>{row.label}</td>
            <td style={{ ...styles.cellRight, fontWeight: row.strong ? 700 : 400 }}>
              {formatUsd(row.cents)}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** The cautions of PRODUCT.md §7, in full, wherever a message sends someone up a ladder or near bats. */
export function CautionList({ cautions }: { cautions: readonly Caution[] }) {
  return (
    <Section>
      <H2>Stay safe</H2>
      {cautions.map((caution) => (
        <Section key={caution.id} style={styles.caution}>
          <Text style={{ ...styles.p, fontWeight: 700, margin: "0 0 4px" }}>{caution.title}</Text>
          <Text style={{ ...styles.p, margin: 0 }}>{caution.text}</Text>
        </Section>
      ))}
    </Section>
  );
}
