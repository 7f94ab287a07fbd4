"use client";

import { useCallback, useEffect, useId, useRef, useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/select";
import { describeBearing } from "@/lib/placement/bearing";
import {
  nearestSkylineIndex,
  SKYLINE_DIRECTIONS,
  skylineDirectionName,
} from "@/lib/placement/skyline";
import { readSightLine, toSkylineAngle, type SightLine } from "@/lib/placement/skyline-sensor";

type MeasureState =
  | { kind: "idle" }
  | { kind: "starting" }
  | { kind: "live"; sight: SightLine }
  | { kind: "unavailable"; reason: string };

/** Safari's extras on the standard interfaces (iOS 13 and later). */
type PermissionedOrientation = typeof DeviceOrientationEvent & {
  requestPermission?: () => Promise<"granted" | "denied">;
};
type SafariOrientationEvent = DeviceOrientationEvent & { webkitCompassHeading?: number };

/** No reading this long after the start means the device has no sensors to share. */
const FIRST_READING_MS = 3000;

const FALLBACK =
  "Type the angles instead: stand where the house will hang, hold your arm straight out and count fists from level up to the tops of the trees or roofs; one fist is about 10°.";

/**
 * Measures the skyline with the phone's compass and tilt sensors: the buyer sights along the top
 * edge at the treetops in one direction and records it into the grid. Where the browser shares
 * no sensors (most computers, some browsers, pages not served over https) it says so and
 * points back to the grid.
 */
export function SkylineMeasure({ onRecord }: { onRecord: (index: number, angle: number) => void }) {
  const id = useId().replace(/:/g, "");
  const [state, setState] = useState<MeasureState>({ kind: "idle" });
  const [manualIndex, setManualIndex] = useState(8);
  const [recorded, setRecorded] = useState("");
  const stopRef = useRef<(() => void) | null>(null);

  const stop = useCallback(() => {
    stopRef.current?.();
    stopRef.current = null;
  }, []);
  useEffect(() => stop, [stop]);

  async function start() {
    stop();
    const Orientation =
      typeof window !== "undefined" && "DeviceOrientationEvent" in window
        ? (window.DeviceOrientationEvent as PermissionedOrientation)
        : undefined;
    if (!Orientation) {
      setState({
        kind: "unavailable",
        reason: "This browser does not share a compass or tilt sensor.",
      });
      return;
    }
    setState({ kind: "starting" });
    if (typeof Orientation.requestPermission === "function") {
      // iOS asks the buyer once, and only from a tap: this click handler is that tap.
      const answer = await Orientation.requestPermission().catch(() => "denied" as const);
      if (answer !== "granted") {
        setState({
          kind: "unavailable",
          reason:
            "Access to motion and orientation was not allowed. You can allow it in the browser's settings for this site and try again.",
        });
        return;
      }
    }
    // Chrome sends north-referenced readings as a separate event; others mark them absolute.
    const eventName =
      "ondeviceorientationabsolute" in window ? "deviceorientationabsolute" : "deviceorientation";
    let heard = false;
    const onReading = (event: Event) => {
      const e = event as SafariOrientationEvent;
      const sight = readSightLine({
        alpha: e.alpha,
        beta: e.beta,
        gamma: e.gamma,
        absolute: eventName === "deviceorientationabsolute" || e.absolute,
        compassHeading: e.webkitCompassHeading ?? null,
      });
      if (!sight) return;
      heard = true;
      setState({ kind: "live", sight });
    };
    window.addEventListener(eventName, onReading);
    const timer = window.setTimeout(() => {
      if (heard) return;
      stop();
      setState({
        kind: "unavailable",
        reason:
          "No compass or tilt readings came from this device. A laptop or desktop has no such sensors, and some browsers share them only on secure (https) pages.",
      });
    }, FIRST_READING_MS);
    stopRef.current = () => {
      window.removeEventListener(eventName, onReading);
      window.clearTimeout(timer);
    };
  }

  const live = state.kind === "live" ? state.sight : null;
  const index = live?.headingDeg != null ? nearestSkylineIndex(live.headingDeg) : manualIndex;
  const angle = live ? toSkylineAngle(live.elevationDeg) : 0;

  function record() {
    onRecord(index, angle);
    setRecorded(`Recorded ${angle}° toward the ${skylineDirectionName(index)}.`);
  }

  return (
    <div className="flex flex-col gap-3 rounded-xl border border-paper-300 bg-paper-50 p-3">
      <p className="text-sm text-ink-soft" id={`${id}-how`}>
        On a phone: stand at the foot of the pole or wall (no need to climb), hold the phone flat,
        screen up, and sight along its top edge. Tilt it up until the edge meets the tops of the
        trees or roofs, then record that direction. Compass readings are magnetic, a little off true
        north in most places; within one box of the grid that matters little.
      </p>
      {state.kind === "idle" || state.kind === "unavailable" ? (
        <div>
          <Button type="button" variant="secondary" onClick={start} aria-describedby={`${id}-how`}>
            Measure with this phone
          </Button>
        </div>
      ) : null}
      {state.kind === "starting" ? (
        <p className="text-sm">Waiting for the phone&apos;s sensors…</p>
      ) : null}
      {live ? (
        <div className="flex flex-col gap-3">
          <p className="text-lg font-bold tabular-nums">
            {live.headingDeg != null
              ? `Pointing ${describeBearing(live.headingDeg)} (${Math.round(live.headingDeg)}°), `
              : ""}
            {Math.round(live.elevationDeg)}° above level
          </p>
          {live.headingDeg == null ? (
            <div className="flex max-w-64 flex-col gap-1">
              <label htmlFor={`${id}-dir`} className="text-sm font-bold">
                No compass here: which way are you pointing?
              </label>
              <Select
                id={`${id}-dir`}
                value={manualIndex}
                onChange={(e) => setManualIndex(Number(e.target.value))}
              >
                {Array.from({ length: SKYLINE_DIRECTIONS }, (_, k) => (
                  <option key={k} value={k}>
                    {skylineDirectionName(k)}
                  </option>
                ))}
              </Select>
            </div>
          ) : null}
          <div className="flex flex-wrap gap-2">
            <Button type="button" onClick={record}>
              Record {angle}° for the {skylineDirectionName(index)}
            </Button>
            <Button
              type="button"
              variant="ghost"
              onClick={() => {
                stop();
                setState({ kind: "idle" });
              }}
            >
              Stop measuring
            </Button>
          </div>
        </div>
      ) : null}
      {state.kind === "unavailable" ? (
        <Alert tone="warn" title="The phone's sensors are not available here" live>
          {state.reason} {FALLBACK}
        </Alert>
      ) : null}
      <p aria-live="polite" className="text-sm font-bold text-moss-800">
        {recorded}
      </p>
    </div>
  );
}
