// Outside reference: `astronomy-engine` (Don Cross, npm "astronomy-engine" 2.1, a general-purpose
// astronomy library built on VSOP87 and NOVAS; not the library the product code uses). The same
// minute-by-minute integral is computed here from its topocentric horizon coordinates with
// normal refraction (matching suncalc's apparent altitude), and must agree within 3 minutes.
import { Body, Equator, Horizon, MakeTime, Observer, SearchHourAngle } from "astronomy-engine";
import { describe, expect, it } from "vitest";
import { sunHoursOnFace } from "@/lib/placement/sun";

const DEG = Math.PI / 180;
const FACES = { east: 90, "south-east": 135, south: 180, "south-west": 225, west: 270 };
const LATITUDES = [30, 40, 50];
const DATES = ["2026-05-01", "2026-06-21", "2026-08-15"];
const LON = -95;

type SunSample = { altitude: number; azimuth: number };

/** 1,440 mid-minute sun positions over the 24 h centred on astronomy-engine's solar noon. */
function sampleReferenceDay({ lat, lon, date }: { lat: number; lon: number; date: string }) {
  const observer = new Observer(lat, lon, 0);
  const localMidnight = Date.parse(`${date}T00:00:00Z`) - (lon / 15) * 3_600_000;
  const noon = SearchHourAngle(Body.Sun, observer, 0, MakeTime(new Date(localMidnight))).time;
  const samples: SunSample[] = [];
  for (let i = 0; i < 1440; i++) {
    const time = noon.AddDays((i - 720 + 0.5) / 1440);
    const eq = Equator(Body.Sun, time, observer, true, true);
    const hor = Horizon(time, observer, eq.ra, eq.dec, "normal");
    samples.push({ altitude: hor.altitude, azimuth: hor.azimuth });
  }
  return { noonMs: noon.date.getTime(), samples };
}

function countFaceMinutes(samples: SunSample[], facingDeg: number) {
  let total = 0;
  let morning = 0;
  samples.forEach(({ altitude, azimuth }, i) => {
    if (altitude > 0 && Math.cos(altitude * DEG) * Math.cos((azimuth - facingDeg) * DEG) > 0) {
      total++;
      if (i < 720) morning++;
    }
  });
  return { total, morning };
}

describe("sun hours agree with astronomy-engine within 3 minutes", () => {
  for (const lat of LATITUDES) {
    for (const date of DATES) {
      it(`${lat}° N on ${date}`, () => {
        const reference = sampleReferenceDay({ lat, lon: LON, date });
        for (const [name, facingDeg] of Object.entries(FACES)) {
          const expected = countFaceMinutes(reference.samples, facingDeg);
          const ours = sunHoursOnFace({ lat, lon: LON, facingDeg, date });
          const context = `${name} face`;
          expect(Math.abs(ours.hours * 60 - expected.total), context).toBeLessThanOrEqual(3);
          expect(Math.abs(ours.morningHours * 60 - expected.morning), context).toBeLessThanOrEqual(
            3,
          );
        }
        // Both libraries find the same local solar noon to within half a minute.
        const ours = sunHoursOnFace({ lat, lon: LON, facingDeg: 180, date });
        expect(Math.abs(Date.parse(ours.solarNoon) - reference.noonMs)).toBeLessThan(30_000);
      });
    }
  }
});
