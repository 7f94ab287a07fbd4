import { formatUsd } from "@/lib/checkout/money";

/** "2 × Hollow Four … $298.00", one line per house; nothing for a gift on its own. */
export function OrderLineList({
  lines,
  className = "",
}: {
  lines: { id: string; name: string; quantity: number; unitPriceCents: number }[];
  className?: string;
}) {
  if (lines.length === 0) return null;
  return (
    <ul className={`flex flex-col gap-1 ${className}`}>
      {lines.map((l) => (
        <li key={l.id} className="flex justify-between gap-3">
          <span>
            {l.quantity} × {l.name}
          </span>
          <span>{formatUsd(l.unitPriceCents * l.quantity)}</span>
        </li>
      ))}
    </ul>
  );
}
