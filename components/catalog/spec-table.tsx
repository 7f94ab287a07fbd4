import { Table, TBody, Td, Th, Tr } from "@/components/ui/table";
import {
  formatInches,
  INTERIOR_FINISH_LABELS,
  INTERIOR_SURFACE_LABELS,
  SHADE_LABELS,
  WOOD_LABELS,
  type HouseSpec,
} from "@/lib/catalog/spec";

const yesNo = (b: boolean) => (b ? "Yes" : "No");
const KG_PER_LB = 0.45359237;

export function SpecTable({
  spec,
  carton,
}: {
  spec: HouseSpec;
  carton?: { lengthIn: number; widthIn: number; heightIn: number; weightLb: number };
}) {
  const rows: [string, string][] = [
    ["Chambers", String(spec.chamberCount)],
    ["Chamber gap (front to back)", formatInches(spec.chamberGapIn)],
    ["Chamber height (inside)", formatInches(spec.chamberHeightIn)],
    ["Chamber width (inside)", formatInches(spec.chamberWidthIn)],
    ["Landing area below the entrance", formatInches(spec.landingAreaIn)],
    ["Inside surface", INTERIOR_SURFACE_LABELS[spec.interiorSurface]],
    ...(spec.interiorSurface === "grooved" && spec.grooveSpacingIn && spec.grooveDepthIn
      ? ([["Grooves", `${formatInches(spec.grooveSpacingIn)} apart, ${formatInches(spec.grooveDepthIn)} deep`]] as [string, string][])
      : []),
    ["Inside finish", INTERIOR_FINISH_LABELS[spec.interiorFinish]],
    ["Seams sealed", yesNo(spec.seamsSealed)],
    ["Wood", WOOD_LABELS[spec.wood]],
    ["Outside height", formatInches(spec.outerHeightIn)],
    ["Outside width", formatInches(spec.outerWidthIn)],
    ["Open bottom", yesNo(spec.openBottom)],
    ["Outside shade", SHADE_LABELS[spec.exteriorShade]],
    ["Vents", yesNo(spec.vented)],
  ];
  if (carton) {
    rows.push([
      "Shipping carton",
      `${carton.lengthIn} × ${carton.widthIn} × ${carton.heightIn} in (${Math.round(carton.lengthIn * 2.54)} × ${Math.round(carton.widthIn * 2.54)} × ${Math.round(carton.heightIn * 2.54)} cm), ${carton.weightLb} lb (${(carton.weightLb * KG_PER_LB).toFixed(1)} kg)`,
    ]);
  }
  return (
    <Table caption="Measurements of this house" hideCaption wrapperClassName="mt-4">
      <TBody>
        {rows.map(([label, value]) => (
          <Tr key={label}>
            <Th scope="row">{label}</Th>
            <Td>{value}</Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
