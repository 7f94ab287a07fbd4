import type { ContrastUse } from "./contrast";
import { palette as p } from "./palette";

// The colour pairs the UI primitives actually use, each with the WCAG 2.2 AA use it must meet.
// tests/unit/ui/palette-contrast.test.ts checks every one; add a pair here when a component
// starts using a new combination.
type ContrastPair = { name: string; foreground: string; background: string; use: ContrastUse };

export const contrastPairs: readonly ContrastPair[] = [
  { name: "body text on page", foreground: p.ink.DEFAULT, background: p.paper[100], use: "text" },
  { name: "body text on card", foreground: p.ink.DEFAULT, background: p.paper[50], use: "text" },
  { name: "hint text on page", foreground: p.ink.soft, background: p.paper[100], use: "text" },
  { name: "hint text on card", foreground: p.ink.soft, background: p.paper[50], use: "text" },
  { name: "heading on page", foreground: p.moss[800], background: p.paper[100], use: "text" },
  { name: "link on page", foreground: p.dusk[700], background: p.paper[100], use: "text" },
  { name: "link on card", foreground: p.dusk[700], background: p.paper[50], use: "text" },
  { name: "primary button label", foreground: p.bark[900], background: p.ember[400], use: "text" },
  {
    name: "primary button hover label",
    foreground: p.bark[900],
    background: p.ember[300],
    use: "text",
  },
  {
    name: "primary button edge on page",
    foreground: p.ember[600],
    background: p.paper[100],
    use: "ui",
  },
  { name: "secondary button label", foreground: p.moss[800], background: p.paper[50], use: "text" },
  { name: "secondary button edge", foreground: p.moss[600], background: p.paper[100], use: "ui" },
  {
    name: "ghost button hover label",
    foreground: p.moss[800],
    background: p.moss[50],
    use: "text",
  },
  { name: "danger button label", foreground: p.paper[50], background: p.berry[600], use: "text" },
  {
    name: "danger button hover label",
    foreground: p.paper[50],
    background: p.berry[700],
    use: "text",
  },
  { name: "input border on card", foreground: p.bark[400], background: p.paper[50], use: "ui" },
  { name: "input border on page", foreground: p.bark[400], background: p.paper[100], use: "ui" },
  { name: "invalid input border", foreground: p.berry[600], background: p.paper[50], use: "ui" },
  { name: "error message", foreground: p.berry[700], background: p.paper[100], use: "text" },
  { name: "focus ring on page", foreground: p.dusk[500], background: p.paper[100], use: "ui" },
  { name: "focus ring on card", foreground: p.dusk[500], background: p.paper[50], use: "ui" },
  { name: "skip link", foreground: p.paper[50], background: p.moss[800], use: "text" },
  { name: "placeholder text", foreground: p.bark[500], background: p.paper[50], use: "text" },
  { name: "footer text", foreground: p.paper[200], background: p.moss[900], use: "text" },
  { name: "footer link", foreground: p.paper[50], background: p.moss[900], use: "text" },
  { name: "footer muted text", foreground: p.moss[200], background: p.moss[900], use: "text" },
  { name: "focus ring in footer", foreground: p.ember[300], background: p.moss[900], use: "ui" },
  { name: "badge neutral", foreground: p.bark[800], background: p.bark[100], use: "text" },
  { name: "badge good", foreground: p.moss[800], background: p.moss[100], use: "text" },
  { name: "badge fair", foreground: p.ember[900], background: p.ember[100], use: "text" },
  { name: "badge poor", foreground: p.berry[800], background: p.berry[100], use: "text" },
  { name: "badge info", foreground: p.dusk[800], background: p.dusk[100], use: "text" },
  { name: "badge warn", foreground: p.ember[900], background: p.ember[200], use: "text" },
  { name: "notice info text", foreground: p.dusk[900], background: p.dusk[50], use: "text" },
  { name: "notice good text", foreground: p.moss[900], background: p.moss[50], use: "text" },
  { name: "notice warn text", foreground: p.bark[900], background: p.ember[50], use: "text" },
  { name: "notice poor text", foreground: p.berry[900], background: p.berry[50], use: "text" },
  { name: "notice info edge", foreground: p.dusk[500], background: p.dusk[50], use: "ui" },
  { name: "notice good edge", foreground: p.moss[500], background: p.moss[50], use: "ui" },
  { name: "notice warn edge", foreground: p.ember[600], background: p.ember[50], use: "ui" },
  { name: "notice poor edge", foreground: p.berry[500], background: p.berry[50], use: "ui" },
  { name: "progress fill on track", foreground: p.moss[600], background: p.paper[300], use: "ui" },
  { name: "checkbox edge on card", foreground: p.bark[500], background: p.paper[50], use: "ui" },
  { name: "table header text", foreground: p.moss[900], background: p.paper[200], use: "text" },
];
