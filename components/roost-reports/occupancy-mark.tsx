import { percent } from "./format";

/** The catalog card's small mark: the share with bats within two summers, or that reports are still few. */
export function OccupancyMark({ occupancy }: { occupancy: { n: number; shown: boolean; k?: number; rate?: number; demo: boolean } }) {
  const demo = occupancy.demo ? " (demo)" : "";
  if (occupancy.shown && occupancy.k !== undefined && occupancy.rate !== undefined) {
    return (
      <p className="flex items-center gap-1.5 text-sm text-moss-800" data-testid="occupancy-mark">
        <svg aria-hidden="true" viewBox="0 0 16 16" className="size-4 fill-current">
          <path d="M8 3c1.2 1.6 2.6 2.4 4.6 2.2-.6 1.7-.4 3.3.9 4.6-1.9.1-3.3 1-3.9 2.7C9 11.4 8.5 11 8 11s-1 .4-1.6 1.5C5.8 10.8 4.4 9.9 2.5 9.8c1.3-1.3 1.5-2.9.9-4.6C5.4 5.4 6.8 4.6 8 3z" />
        </svg>
        <span>
          Bats within two summers: {occupancy.k} of {occupancy.n} reported ({percent(occupancy.rate)}){demo}
        </span>
      </p>
    );
  }
  return (
    <p className="text-sm text-ink-soft" data-testid="occupancy-mark">
      {occupancy.n} {occupancy.n === 1 ? "house" : "houses"} reported: not enough for a rate yet{demo}
    </p>
  );
}
