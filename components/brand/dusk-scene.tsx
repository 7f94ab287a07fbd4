import { useId } from "react";

import { BatShape } from "./bat-shape";
import { getCrescentPath } from "./crescent-path";
import { palette as p } from "./palette";

const moon = getCrescentPath({
  outer: { cx: 136, cy: 86, r: 20 },
  inner: { cx: 146, cy: 78, r: 17 },
});

const stars: ReadonlyArray<readonly [number, number, number]> = [
  [60, 40, 1.4],
  [212, 30, 1.1],
  [262, 92, 1.3],
  [330, 46, 1],
  [478, 28, 1.5],
  [560, 70, 1.1],
  [602, 24, 1],
  [96, 140, 1],
  [520, 120, 0.9],
  [384, 84, 1.2],
];

type DuskSceneProps = { className?: string; title?: string };

/**
 * The home hero: a roost house on its pole in an open clearing at dusk, woods kept well back,
 * a pond below and bats heading out. Our own drawing; decorative unless given a title.
 */
export function DuskScene({ className, title }: DuskSceneProps) {
  const id = useId().replace(/:/g, "");
  const sky = `${id}-sky`;
  const glow = `${id}-glow`;
  const pond = `${id}-pond`;

  return (
    <svg
      viewBox="0 0 640 400"
      className={className}
      preserveAspectRatio="xMidYMid slice"
      role={title ? "img" : undefined}
      aria-label={title || undefined}
      aria-hidden={title ? undefined : true}
      focusable="false"
    >
      <defs>
        <linearGradient id={sky} x1="0" y1="0" x2="0" y2="1">
          <stop offset="0" stopColor={p.dusk[900]} />
          <stop offset="0.42" stopColor={p.dusk[600]} />
          <stop offset="0.72" stopColor={p.dusk[300]} />
          <stop offset="0.9" stopColor={p.ember[200]} />
        </linearGradient>
        <radialGradient id={glow} cx="0.78" cy="0.78" r="0.45">
          <stop offset="0" stopColor={p.ember[300]} stopOpacity="0.75" />
          <stop offset="1" stopColor={p.ember[300]} stopOpacity="0" />
        </radialGradient>
        <linearGradient id={pond} x1="0" y1="0" x2="0" y2="1">
          <stop offset="0" stopColor={p.ember[200]} />
          <stop offset="1" stopColor={p.dusk[400]} />
        </linearGradient>
      </defs>

      <rect width="640" height="400" fill={`url(#${sky})`} />
      <rect width="640" height="400" fill={`url(#${glow})`} />
      {stars.map(([cx, cy, r]) => (
        <circle key={`${cx}-${cy}`} cx={cx} cy={cy} r={r} fill={p.paper[50]} opacity="0.8" />
      ))}
      <path d={moon} fill={p.ember[100]} />

      {/* Far ridge, then the woods edge on the left, well away from the pole. */}
      <path
        d="M0 292c80-26 150-34 228-22s150 20 230 4 132-30 182-18v144H0z"
        fill={p.moss[600]}
        opacity="0.55"
      />
      <path
        d="M0 320V226l14 30 10-44 14 40 12-58 15 52 10-36 13 46 12-30 14 52 10-22 12 40 10-16 10 40v26z"
        fill={p.moss[900]}
      />
      <path d="M0 330c120-18 260-24 400-12s190 14 240 6v76H0z" fill={p.moss[800]} />
      <ellipse cx="520" cy="362" rx="84" ry="12" fill={`url(#${pond})`} opacity="0.9" />
      <path d="M0 372c140-10 300-12 460-2 70 5 130 4 180-2v32H0z" fill={p.moss[900]} />

      {/* Pole and house: chamber openings (the dark slot) above a grooved landing board. */}
      <rect x="356" y="176" width="9" height="180" rx="2" fill={p.bark[800]} />
      <path d="M326 118 360.5 92 395 118l-4 5-30.5-22.5L330 123z" fill={p.bark[800]} />
      <path d="M333 121.5 360.5 101 388 121.5V178h-55z" fill={p.bark[500]} />
      <path
        d="M340 132h41M340 142h41M340 152h41M340 162h41"
        stroke={p.bark[600]}
        strokeWidth="1.2"
      />
      <rect x="340" y="168" width="41" height="3" rx="1" fill={p.bark[700]} />
      <rect x="333" y="178" width="55" height="3" fill={p.bark[900]} />
      <path d="M333 181h55v17a2 2 0 0 1-2 2h-51a2 2 0 0 1-2-2z" fill={p.bark[400]} />
      <path d="M338 186h45M338 190h45M338 194h45" stroke={p.bark[500]} strokeWidth="0.9" />

      <BatShape x={300} y={150} scale={2.2} rotate={-10} fill={p.dusk[900]} />
      <BatShape x={250} y={110} scale={1.6} rotate={8} fill={p.dusk[900]} opacity={0.9} />
      <BatShape x={430} y={74} scale={1.9} rotate={-6} fill={p.dusk[900]} />
      <BatShape x={470} y={128} scale={1.2} rotate={14} fill={p.dusk[800]} opacity={0.85} />
      <BatShape x={204} y={176} scale={1.1} rotate={-16} fill={p.dusk[800]} opacity={0.8} />
    </svg>
  );
}
