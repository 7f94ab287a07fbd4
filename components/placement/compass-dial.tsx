"use client";

import { useRef, type KeyboardEvent, type PointerEvent } from "react";
import { cn } from "@/components/ui/cn";
import { listFacingSectors } from "@/lib/placement/facing-rule";
import {
  bearingFromOffset,
  describeDialValue,
  DIAL_MAX,
  pointAt,
  ringSectorPath,
  stepBearing,
} from "./dial-math";

const OUTER = 104;
const INNER = 84;
const KNOB_RADIUS = 94;
const CARDINALS = [
  { bearing: 0, label: "N" },
  { bearing: 90, label: "E" },
  { bearing: 180, label: "S" },
  { bearing: 270, label: "W" },
];
const TICKS = Array.from({ length: 24 }, (_, i) => i * 15);

type CompassDialProps = {
  value: number;
  onChange: (bearing: number) => void;
  /** Latitude of the site when known: the good and fair arcs are mirrored south of the equator. */
  lat?: number;
  /** Ids of the visible label and hint of the dial. */
  labelledBy: string;
  describedBy?: string;
  className?: string;
};

/**
 * A compass to set which way the house faces: drag the ember knob (mouse, pen or finger), or
 * focus it and use the arrow keys (5°, with Shift 15°), Page Up/Down (15°), Home (north) and End.
 * The shaded arcs show where the facing rule rates good and fair, so the buyer sees the target.
 */
export function CompassDial({
  value,
  onChange,
  lat = 40,
  labelledBy,
  describedBy,
  className,
}: CompassDialProps) {
  const dragging = useRef(false);
  const safeValue = Number.isFinite(value) ? value : 0;
  const knob = pointAt({ bearing: safeValue, radius: KNOB_RADIUS });
  const tip = pointAt({ bearing: safeValue, radius: INNER - 6 });

  function setFromPointer(event: PointerEvent<HTMLDivElement>) {
    const box = event.currentTarget.getBoundingClientRect();
    const bearing = bearingFromOffset({
      dx: event.clientX - (box.left + box.width / 2),
      dy: event.clientY - (box.top + box.height / 2),
    });
    if (bearing !== safeValue) onChange(bearing);
  }

  function onKeyDown(event: KeyboardEvent<HTMLDivElement>) {
    const next = stepBearing({ bearing: safeValue, key: event.key, shiftKey: event.shiftKey });
    if (next === null) return;
    event.preventDefault();
    onChange(next);
  }

  return (
    <div
      role="slider"
      tabIndex={0}
      aria-labelledby={labelledBy}
      aria-describedby={describedBy}
      aria-valuemin={0}
      aria-valuemax={DIAL_MAX}
      aria-valuenow={safeValue}
      aria-valuetext={describeDialValue(safeValue)}
      onKeyDown={onKeyDown}
      onPointerDown={(event) => {
        dragging.current = true;
        event.currentTarget.setPointerCapture(event.pointerId);
        event.currentTarget.focus();
        setFromPointer(event);
      }}
      onPointerMove={(event) => {
        if (dragging.current) setFromPointer(event);
      }}
      onPointerUp={() => {
        dragging.current = false;
      }}
      onPointerCancel={() => {
        dragging.current = false;
      }}
      className={cn(
        "relative aspect-square w-full max-w-60 cursor-grab touch-none rounded-full select-none active:cursor-grabbing",
        "focus-visible:outline-3 focus-visible:outline-offset-4 focus-visible:outline-dusk-500",
        className,
      )}
    >
      <svg viewBox="-120 -120 240 240" aria-hidden="true" className="size-full overflow-visible">
        <circle r={112} className="fill-paper-50 stroke-paper-300" strokeWidth={1.5} />
        {listFacingSectors({ lat }).map((s) => (
          <path
            key={`${s.from}-${s.to}`}
            d={ringSectorPath({ from: s.from, to: s.to, inner: INNER, outer: OUTER })}
            className={s.status === "good" ? "fill-moss-200" : "fill-ember-100"}
          />
        ))}
        <circle r={OUTER} fill="none" className="stroke-bark-300" strokeWidth={1} />
        <circle r={INNER} fill="none" className="stroke-paper-300" strokeWidth={1} />
        {TICKS.map((bearing) => {
          const major = bearing % 90 === 0;
          const a = pointAt({ bearing, radius: OUTER });
          const b = pointAt({ bearing, radius: major ? OUTER - 12 : OUTER - 6 });
          return (
            <line
              key={bearing}
              x1={a.x}
              y1={a.y}
              x2={b.x}
              y2={b.y}
              className={major ? "stroke-bark-600" : "stroke-bark-400"}
              strokeWidth={major ? 2 : 1}
            />
          );
        })}
        {CARDINALS.map(({ bearing, label }) => {
          const p = pointAt({ bearing, radius: 66 });
          return (
            <text
              key={label}
              x={p.x}
              y={p.y}
              textAnchor="middle"
              dominantBaseline="central"
              className="fill-ink-soft font-display text-[17px] font-semibold"
            >
              {label}
            </text>
          );
        })}
        {/* The house seen from above: its front (ember edge) turns to face the bearing. */}
        <g transform={`rotate(${safeValue})`}>
          <rect
            x={-17}
            y={-9}
            width={34}
            height={16}
            rx={2}
            className="fill-bark-200 stroke-bark-700"
            strokeWidth={1.5}
          />
          <line
            x1={-17}
            y1={-9}
            x2={17}
            y2={-9}
            className="stroke-ember-600"
            strokeWidth={4}
            strokeLinecap="round"
          />
        </g>
        <line
          x1={0}
          y1={0}
          x2={tip.x}
          y2={tip.y}
          className="stroke-moss-800"
          strokeWidth={2}
          strokeDasharray="4 4"
        />
        <circle
          cx={knob.x}
          cy={knob.y}
          r={11}
          className="fill-ember-400 stroke-bark-900"
          strokeWidth={2}
        />
        <circle cx={knob.x} cy={knob.y} r={3} className="fill-bark-900" />
      </svg>
    </div>
  );
}
