/** Where a stored photo size is served from (app/media/[...key]/route.ts streams it from the store). */
export function photoUrl(photo: { keyBase: string; widths: number[] }, want: number): string {
  const sorted = [...photo.widths].sort((a, b) => a - b);
  const width = sorted.find((w) => w >= want) ?? sorted[sorted.length - 1] ?? want;
  return `/media/${photo.keyBase}-${width}.webp`;
}

export function photoSrcSet(photo: { keyBase: string; widths: number[] }): string {
  return photo.widths.map((w) => `/media/${photo.keyBase}-${w}.webp ${w}w`).join(", ");
}

export function drawingUrl(slug: string): string {
  return `/houses/${encodeURIComponent(slug)}/drawing.svg`;
}
