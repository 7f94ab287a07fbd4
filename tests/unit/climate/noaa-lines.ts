// Builds lines in the official fixed-width layout of the NOAA NCEI 1981–2010 normals files
// (readme, restated in ../shared/data/noaa-normals-1981-2010/SOURCE.md), so parser tests can
// feed both good and broken lines. noaa-files.test.ts checks these builders against real lines.

export function tmaxLine(
  id: string,
  tenths: readonly number[],
  flags: string | readonly string[] = "C",
): string {
  const flagAt = (m: number) => (typeof flags === "string" ? flags : (flags[m] ?? "C"));
  const fields = tenths.map((v, m) => `${String(v).padStart(5)}${flagAt(m)}`);
  return `${id.padEnd(11)}${" ".repeat(7)}${fields.join(" ")}`;
}

/** Twelve months with July (index 6) set and the rest a plausible curve. */
export function monthsWithJuly(julyTenths: number): number[] {
  return [400, 450, 550, 650, 750, 850, julyTenths, 880, 800, 680, 540, 420];
}

export type StationFields = {
  id: string;
  lat: number;
  lon: number;
  elevationM?: number;
  state: string;
  name: string;
  gsn?: string;
  hcnCrn?: string;
  wmo?: string;
};

export function stationLine(s: StationFields): string {
  return [
    s.id.padEnd(11),
    s.lat.toFixed(4).padStart(8),
    s.lon.toFixed(4).padStart(9),
    (s.elevationM ?? 100).toFixed(1).padStart(6),
    s.state,
    s.name.padEnd(30),
    (s.gsn ?? "").padEnd(3),
    (s.hcnCrn ?? "").padEnd(3),
    (s.wmo ?? "").padEnd(5),
  ].join(" ");
}
