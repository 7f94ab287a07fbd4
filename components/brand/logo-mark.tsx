import { palette } from "./palette";
import { BatShape } from "./bat-shape";
import { getCrescentPath } from "./crescent-path";

const moon = getCrescentPath({
  outer: { cx: 37, cy: 11, r: 7 },
  inner: { cx: 40.5, cy: 8.5, r: 6 },
});

type LogoMarkProps = {
  className?: string;
  /** "dark" draws the house in moss for paper grounds; "light" in paper for dark grounds. */
  tone?: "dark" | "light";
  /** Accessible name; leave empty when a visible wordmark sits next to it. */
  title?: string;
};

/**
 * Roostwright's mark: a tall roost house with its landing board hanging below the chambers,
 * a rising crescent and one bat heading home. Our own drawing, 48 × 48.
 */
export function LogoMark({ className, tone = "dark", title }: LogoMarkProps) {
  const house = tone === "dark" ? palette.moss[800] : palette.paper[50];
  const board = tone === "dark" ? palette.bark[500] : palette.bark[200];
  return (
    <svg
      viewBox="0 0 48 48"
      className={className}
      role={title ? "img" : undefined}
      aria-label={title || undefined}
      aria-hidden={title ? undefined : true}
      focusable="false"
    >
      <path d={moon} fill={palette.ember[400]} />
      <path d="M6 20.5 20 10l14 10.5-2 2.4L20 14 8 22.9z" fill={house} />
      <path d="M10 22.4 20 15l10 7.4V37H10z" fill={house} />
      <path d="M10 38.4h20v5.4a1.2 1.2 0 0 1-1.2 1.2H11.2a1.2 1.2 0 0 1-1.2-1.2z" fill={board} />
      <path
        d="M12.5 40.6h15M12.5 42.8h15"
        stroke={tone === "dark" ? palette.paper[100] : palette.bark[600]}
        strokeWidth="0.7"
        opacity="0.7"
      />
      <BatShape
        x={38.5}
        y={27}
        scale={0.42}
        rotate={-12}
        fill={tone === "dark" ? palette.dusk[700] : palette.dusk[100]}
      />
    </svg>
  );
}
