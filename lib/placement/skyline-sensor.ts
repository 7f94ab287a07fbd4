// Measuring the skyline with a phone, the way a hand clinometer is used: the buyer holds the
// phone screen up and sights along its top edge at the top of the trees or roof in one
// direction; the orientation sensors give the compass heading and the tilt of that edge.
//
// Source: W3C "DeviceOrientation Event Specification" (Working Draft, 2023): alpha, beta and
// gamma are intrinsic Z-X'-Y'' rotations of the device frame against the earth frame (x east,
// y north, z up), so R = Rz(alpha)·Rx(beta)·Ry(gamma), and the top edge, +y in the device
// frame, points along the second column of R, which gamma leaves alone:
//   east = −cos β sin α,  north = cos β cos α,  up = sin β
// so the edge's elevation is beta itself (within ±90°) and its heading is 360° − alpha.
// Heading needs an absolute alpha (Chrome's `deviceorientationabsolute`, or `absolute: true`);
// Safari on iOS gives `webkitCompassHeading` instead (degrees clockwise from magnetic north, for
// the top edge; Apple's Safari DOM reference), and only after
// DeviceOrientationEvent.requestPermission(). Both are MAGNETIC headings: off true north by the
// local declination (up to about 16° in the lower 48), less than one 22.5° step of the skyline.
const RAD = Math.PI / 180;
const DEG = 180 / Math.PI;

export type Orientation = { alpha: number | null; beta: number | null; gamma: number | null };

/** Where the top edge points: elevation above the horizontal, and the heading if known. */
export type SightLine = { elevationDeg: number; headingDeg: number | null };

export function readSightLine({
  alpha,
  beta,
  absolute,
  compassHeading,
}: Orientation & {
  /** True when alpha is measured from north (not from wherever the page started). */
  absolute: boolean;
  /** Safari's webkitCompassHeading, when present. */
  compassHeading?: number | null;
}): SightLine | null {
  if (beta === null) return null;
  const [sb, cb] = [Math.sin(beta * RAD), Math.cos(beta * RAD)];
  const elevationDeg = Math.asin(Math.max(-1, Math.min(1, sb))) * DEG;

  let headingDeg: number | null = null;
  if (typeof compassHeading === "number" && Number.isFinite(compassHeading)) {
    headingDeg = ((compassHeading % 360) + 360) % 360;
  } else if (absolute && alpha !== null) {
    const east = -cb * Math.sin(alpha * RAD);
    const north = cb * Math.cos(alpha * RAD);
    // Pointing straight up or down the heading is undefined; say so rather than guess.
    if (Math.hypot(east, north) > 0.05)
      headingDeg = (((Math.atan2(east, north) * DEG) % 360) + 360) % 360;
  }
  return { elevationDeg, headingDeg };
}

/** A reading the skyline can take: 0–90° (below the horizontal counts as open sky, 0). */
export function toSkylineAngle(elevationDeg: number): number {
  return Math.round(Math.max(0, Math.min(90, elevationDeg)));
}
