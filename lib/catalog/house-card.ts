import type { HouseSummary } from "./queries";
import type { Rating } from "@/lib/shared/rating";

/** What a catalog card needs, as the JSON API sends it. */
export type HouseCard = {
  slug: string;
  name: string;
  tagline: string;
  priceCents: number;
  stock: number;
  certified: boolean;
  certificationWords: string;
  chamberCount: number;
  exteriorShade: string;
  vented: boolean;
  mounts: string[];
  notes: number;
  photo: HouseSummary["photo"];
  fit?: { label: Rating; reasons: string[]; repaintTo?: string };
  /** Roost reports (lib/roost-reports): houses reported, and the share with bats where n ≥ 5. */
  occupancy?: { n: number; shown: boolean; k?: number; rate?: number; demo: boolean };
};

export function toHouseCard(h: HouseSummary): HouseCard {
  const card: HouseCard = {
    slug: h.slug,
    name: h.name,
    tagline: h.tagline,
    priceCents: h.priceCents,
    stock: h.stock,
    certified: h.certified,
    certificationWords: h.certification.words,
    chamberCount: h.spec.chamberCount,
    exteriorShade: h.spec.exteriorShade,
    vented: h.spec.vented,
    mounts: h.mounts,
    notes: h.notes,
    photo: h.photo,
  };
  if (h.fit) {
    card.fit = { label: h.fit.label, reasons: h.fit.reasons };
    if (h.fit.repaintTo) card.fit.repaintTo = h.fit.repaintTo;
  }
  return card;
}
