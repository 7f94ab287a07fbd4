import { Badge } from "@/components/ui/badge";
import { FIT_LABEL_WORDS, type FitLabel } from "@/lib/catalog/fit";

export function FitBadge({ label }: { label: FitLabel }) {
  return (
    <Badge tone={label} className="fit-badge">
      {FIT_LABEL_WORDS[label]}
    </Badge>
  );
}
