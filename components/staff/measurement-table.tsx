import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { ToneIcon } from "@/components/ui/tone-icon";
import type { MeasurementCheck } from "@/lib/catalog/certification";

function difference(m: MeasurementCheck): string {
  if (m.differenceIn === undefined) return "—";
  const sixteenths = m.differenceIn * 16;
  const shown =
    Math.abs(sixteenths) < 1e-9
      ? "0"
      : `${sixteenths > 0 ? "+" : "−"}${Number(Math.abs(sixteenths).toFixed(2))}/16 in`;
  return shown;
}

/** Listed beside measured, with the difference in sixteenths (the tolerance is 1/16 in). */
export function MeasurementTable({
  caption,
  measurements,
}: {
  caption: string;
  measurements: MeasurementCheck[];
}) {
  return (
    <Table caption={caption} hideCaption>
      <THead>
        <Tr>
          <Th>Measure</Th>
          <Th>Listed</Th>
          <Th>Measured</Th>
          <Th numeric>Difference</Th>
          <Th>Within 1/16 in</Th>
        </Tr>
      </THead>
      <TBody>
        {measurements.map((m) => (
          <Tr key={m.field}>
            <Td className="font-bold">{m.label}</Td>
            <Td>{m.listed}</Td>
            <Td>{m.measured}</Td>
            <Td numeric>{difference(m)}</Td>
            <Td>
              <span
                className={`inline-flex items-center gap-1.5 font-bold ${m.matches ? "text-moss-800" : "text-berry-700"}`}
              >
                <ToneIcon tone={m.matches ? "good" : "poor"} className="size-4" />
                {m.matches ? "Yes" : "No"}
              </span>
            </Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
