import {
  angleFromHaversine,
  DEG,
  EARTH_RADIUS_MI,
  haversineOfAngle,
  type LatLon,
} from "./geo-distance";
import type { ClimateStation, NormalFlag } from "./noaa";
import { warmestMonthAt, type WarmestMonth } from "./warmest-month";

// Nearest-station lookup over a latitude/longitude grid. The grid is searched ring by ring
// outward from the query's cell and stops once no unvisited cell can hold a station nearer than
// the third-best found, so the answer is exactly what a sort of all stations would give.

const NEIGHBOURS = 3;
const CELL_DEG = 0.5;
// Closer than this (about 50 ft) the reading is the station's own; 1/d² would divide by ~0.
// Common practice, no source.
const SAME_PLACE_MI = 0.01;
// Beyond this many rings (15° at 0.5° cells) a plain scan is cheaper than more rings.
const MAX_RINGS = 30;

type IndexedStation = { station: ClimateStation; lat: number; lon: number; cosLat: number };

export type StationIndex = {
  readonly cellDeg: number;
  readonly rows: number;
  readonly columns: number;
  /** Only cells holding stations, keyed row × columns + column. */
  readonly cells: ReadonlyMap<number, IndexedStation[]>;
  readonly all: IndexedStation[];
};

export type NearbyStation = {
  id: string;
  name: string;
  state: string;
  lat: number;
  lon: number;
  /** Great-circle miles from the point, unrounded. */
  distanceMi: number;
  /** The station's normal daily high for the warmest month at the point, °F (as NOAA gives it, 0.1 °F). */
  highF: number;
  flag: NormalFlag;
};
export type WarmestMonthEstimate = {
  /** The 1/d²-weighted normal, unrounded: the band is chosen from this value. */
  valueF: number;
  month: WarmestMonth;
  stations: NearbyStation[];
};

/** A station's own warmest month (its hemisphere's), and its normal high then; null if NOAA has none. */
const stationMonth = (station: ClimateStation): WarmestMonth => warmestMonthAt(station.lat);
const monthValue = (station: ClimateStation) =>
  stationMonth(station) === "january" ? station.janHighF : station.julyHighF;

const cellRow = (lat: number, cellDeg: number, rows: number) =>
  Math.min(rows - 1, Math.floor((lat + 90) / cellDeg));
const cellColumn = (lon: number, cellDeg: number, columns: number) =>
  ((Math.floor((lon + 180) / cellDeg) % columns) + columns) % columns;

/** Build once per process (about 7,500 stations take a few milliseconds). */
export function createStationIndex(
  stations: readonly ClimateStation[],
  cellDeg = CELL_DEG,
): StationIndex {
  const rows = Math.ceil(180 / cellDeg);
  const columns = Math.ceil(360 / cellDeg);
  const cells = new Map<number, IndexedStation[]>();
  const all = stations.map((station): IndexedStation => {
    const lat = station.lat * DEG;
    return { station, lat, lon: station.lon * DEG, cosLat: Math.cos(lat) };
  });
  for (const item of all) {
    const key =
      cellRow(item.station.lat, cellDeg, rows) * columns +
      cellColumn(item.station.lon, cellDeg, columns);
    const cell = cells.get(key);
    if (cell) cell.push(item);
    else cells.set(key, [item]);
  }
  return { cellDeg, rows, columns, cells, all };
}

type Candidate = { item: IndexedStation; h: number };

/** Keeps the best NEIGHBOURS by haversine (monotonic in distance), smallest first. */
function offer(best: Candidate[], item: IndexedStation, h: number) {
  if (best.length === NEIGHBOURS && h >= (best[NEIGHBOURS - 1]?.h ?? Infinity)) return;
  let at = best.length;
  while (at > 0 && (best[at - 1]?.h ?? -Infinity) > h) at--;
  best.splice(at, 0, { item, h });
  if (best.length > NEIGHBOURS) best.pop();
}

/**
 * A lower bound on the haversine to any point outside the block of cells searched so far:
 * either its latitude differs by at least gapLat (hav d ≥ hav Δlat), or it lies within the
 * block's rows (at most latExtent from the query) and its longitude differs by at least gapLon
 * (hav d ≥ cos lat · cos lat₂ · hav Δlon, with cos lat₂ smallest at the block's pole side).
 */
function haversineOutsideBlock(
  lat: number,
  gapLat: number,
  gapLon: number,
  latExtent: number,
): number {
  const sinHalfLat = Math.sin(Math.min(gapLat, Math.PI) / 2);
  const byLat = sinHalfLat * sinHalfLat;
  if (gapLon >= Math.PI) return byLat;
  const farthestLat = Math.min(Math.PI / 2, Math.abs(lat) + latExtent);
  const sinHalfLon = Math.sin(gapLon / 2);
  return Math.min(byLat, Math.cos(lat) * Math.cos(farthestLat) * sinHalfLon * sinHalfLon);
}

function searchRings(index: StationIndex, lat: number, lon: number, q: LatLon): Candidate[] {
  const { cellDeg, rows, columns, cells } = index;
  const cosLat = Math.cos(lat);
  const row0 = cellRow(q.lat, cellDeg, rows);
  const col0 = cellColumn(q.lon, cellDeg, columns);
  const best: Candidate[] = [];
  const visit = (row: number, col: number) => {
    if (row < 0 || row >= rows) return;
    const cell = cells.get(row * columns + (((col % columns) + columns) % columns));
    if (!cell) return;
    for (const item of cell)
      if (monthValue(item.station) !== null)
        offer(best, item, haversineOfAngle(lat, lon, cosLat, item.lat, item.lon, item.cosLat));
  };
  // Distances from the query to its own cell's edges, in degrees.
  const southGap = q.lat + 90 - row0 * cellDeg;
  const northGap = (row0 + 1) * cellDeg - (q.lat + 90);
  const westGap = ((((q.lon + 180) % 360) + 360) % 360) - col0 * cellDeg;
  const eastGap = cellDeg - westGap;

  for (let ring = 0; ring <= MAX_RINGS; ring++) {
    if (ring === 0) visit(row0, col0);
    for (let d = -ring; d <= ring && ring > 0; d++) {
      visit(row0 - ring, col0 + d);
      visit(row0 + ring, col0 + d);
      if (Math.abs(d) !== ring) {
        visit(row0 + d, col0 - ring);
        visit(row0 + d, col0 + ring);
      }
    }
    const worst = best[NEIGHBOURS - 1];
    if (!worst) continue;
    const gapLat = (Math.min(southGap, northGap) + ring * cellDeg) * DEG;
    const gapLon =
      (2 * ring + 1 >= columns ? 360 : Math.min(westGap, eastGap) + ring * cellDeg) * DEG;
    const latExtent = (ring + 1) * cellDeg * DEG;
    if (worst.h <= haversineOutsideBlock(lat, gapLat, gapLon, latExtent)) return best;
  }
  // Far from every station (open ocean, remote islands): scan them all.
  const scanned: Candidate[] = [];
  for (const item of index.all)
    if (monthValue(item.station) !== null)
      offer(scanned, item, haversineOfAngle(lat, lon, cosLat, item.lat, item.lon, item.cosLat));
  return scanned;
}

/**
 * The normal daily high of the warmest month at a point (July north of the equator, January
 * south of it; lib/climate/warmest-month.ts): each station contributes its own warmest month (its
 * hemisphere's), and `month` names the point's. The three nearest stations with that value, by
 * great-circle distance, weighted by 1/distance² (inverse-distance weighting with power 2; D.
 * Shepard, "A two-dimensional interpolation function for irregularly-spaced data", ACM 1968).
 * Nothing is rounded here: the band is chosen from this value, and only the display rounds.
 */
export function lookupWarmestMonthHigh(index: StationIndex, point: LatLon): WarmestMonthEstimate {
  if (
    !Number.isFinite(point.lat) ||
    !Number.isFinite(point.lon) ||
    Math.abs(point.lat) > 90 ||
    Math.abs(point.lon) > 180
  ) {
    throw new RangeError(`Not a latitude/longitude: ${point.lat}, ${point.lon}.`);
  }
  if (index.all.length === 0) throw new RangeError("The station index is empty.");
  const month = warmestMonthAt(point.lat);
  const best = searchRings(index, point.lat * DEG, point.lon * DEG, point);
  const near = best.map(({ item, h }) => ({
    station: item.station,
    highF: monthValue(item.station) ?? item.station.julyHighF,
    distanceMi: EARTH_RADIUS_MI * angleFromHaversine(h),
  }));

  const first = near[0];
  let valueF: number;
  if (first && first.distanceMi < SAME_PLACE_MI) {
    valueF = first.highF;
  } else {
    let weighted = 0;
    let weights = 0;
    for (const { highF, distanceMi } of near) {
      const w = 1 / (distanceMi * distanceMi);
      weighted += w * highF;
      weights += w;
    }
    valueF = weighted / weights;
  }
  return {
    valueF,
    month,
    stations: near.map(({ station, highF, distanceMi }) => ({
      id: station.id,
      name: station.name,
      state: station.state,
      lat: station.lat,
      lon: station.lon,
      distanceMi,
      highF,
      flag: (stationMonth(station) === "january" ? station.janFlag : station.julyFlag) ?? station.julyFlag,
    })),
  };
}
