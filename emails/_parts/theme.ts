import type { CSSProperties } from "react";
import { palette } from "@/components/brand/palette";

// The store's look in e-mail: the palette of tailwind.config.ts as inline styles (most mail
// programs drop <style> blocks and never load web fonts), a serif for headings like the site's
// display face, and a plain sans-serif body.

export const colors = {
  page: palette.paper[100],
  sheet: palette.paper[50],
  rule: palette.paper[300],
  ink: palette.ink.DEFAULT,
  inkSoft: palette.ink.soft,
  moss: palette.moss[800],
  mossDeep: palette.moss[900],
  mossTint: palette.moss[50],
  bark: palette.bark[700],
  barkTint: palette.bark[50],
  ember: palette.ember[400],
  emberEdge: palette.ember[600],
  emberTint: palette.ember[50],
  emberInk: palette.bark[900],
  berry: palette.berry[700],
  berryTint: palette.berry[50],
  link: palette.dusk[700],
} as const;

const serif = "Georgia, Cambria, 'Times New Roman', serif";
const sans = "'Segoe UI', Helvetica, Arial, sans-serif";

export const styles = {
  body: {
    backgroundColor: colors.page,
    color: colors.ink,
    fontFamily: sans,
    margin: 0,
    padding: "24px 0",
  },
  container: {
    backgroundColor: colors.sheet,
    border: `1px solid ${colors.rule}`,
    borderRadius: "12px",
    maxWidth: "600px",
    margin: "0 auto",
    padding: "0 0 8px",
  },
  masthead: {
    backgroundColor: colors.mossDeep,
    borderRadius: "12px 12px 0 0",
    padding: "18px 28px",
  },
  mastheadText: {
    color: colors.sheet,
    fontFamily: serif,
    fontSize: "20px",
    fontWeight: 600,
    margin: 0,
  },
  mastheadSub: { color: palette.moss[100], fontSize: "13px", margin: "2px 0 0" },
  content: { padding: "8px 28px 0" },
  h1: {
    color: colors.moss,
    fontFamily: serif,
    fontSize: "26px",
    lineHeight: "32px",
    fontWeight: 600,
    margin: "20px 0 8px",
  },
  h2: {
    color: colors.moss,
    fontFamily: serif,
    fontSize: "20px",
    lineHeight: "26px",
    fontWeight: 600,
    margin: "26px 0 6px",
  },
  h3: {
    color: colors.bark,
    fontFamily: serif,
    fontSize: "17px",
    lineHeight: "23px",
    fontWeight: 600,
    margin: "18px 0 4px",
  },
  p: { color: colors.ink, fontSize: "16px", lineHeight: "25px", margin: "0 0 12px" },
  soft: { color: colors.inkSoft, fontSize: "14px", lineHeight: "21px", margin: "0 0 10px" },
  link: { color: colors.link, textDecoration: "underline" },
  hr: { borderColor: colors.rule, margin: "24px 0" },
  button: {
    backgroundColor: colors.ember,
    border: `1px solid ${colors.emberEdge}`,
    borderRadius: "8px",
    color: colors.emberInk,
    display: "inline-block",
    fontSize: "16px",
    fontWeight: 700,
    padding: "12px 20px",
    textDecoration: "none",
  },
  caution: {
    backgroundColor: colors.emberTint,
    borderLeft: `4px solid ${colors.emberEdge}`,
    borderRadius: "8px",
    padding: "12px 16px",
    margin: "0 0 10px",
  },
  note: {
    backgroundColor: colors.mossTint,
    borderLeft: `4px solid ${palette.moss[500]}`,
    borderRadius: "8px",
    padding: "12px 16px",
    margin: "0 0 12px",
  },
  noteFair: {
    backgroundColor: colors.emberTint,
    borderLeft: `4px solid ${colors.emberEdge}`,
    borderRadius: "8px",
    padding: "12px 16px",
    margin: "0 0 12px",
  },
  notePoor: {
    backgroundColor: colors.berryTint,
    borderLeft: `4px solid ${palette.berry[500]}`,
    borderRadius: "8px",
    padding: "12px 16px",
    margin: "0 0 12px",
  },
  footer: {
    color: colors.inkSoft,
    fontSize: "13px",
    lineHeight: "19px",
    margin: "0 0 6px",
    padding: "0 28px",
  },
  cell: {
    borderBottom: `1px solid ${colors.rule}`,
    fontSize: "15px",
    padding: "8px 0",
    verticalAlign: "top",
  },
  cellRight: {
    borderBottom: `1px solid ${colors.rule}`,
    fontSize: "15px",
    padding: "8px 0",
    textAlign: "right",
    verticalAlign: "top",
    whiteSpace: "nowrap",
  },
} satisfies Record<string, CSSProperties>;
