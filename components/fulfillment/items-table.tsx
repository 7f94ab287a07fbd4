import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { DIM_DIVISOR_CUBIC_IN_PER_LB } from "@/lib/checkout/billable-weight";
import type { DetailLine } from "@/lib/fulfillment/queries/order-detail";

const inches = (n: number) => `${Number.isInteger(n) ? n : n.toFixed(1)}`;

/** The houses with their cartons: what to pull from the shelf and how much each box will bill. */
export function ItemsTable({ lines }: { lines: DetailLine[] }) {
  return (
    <Table caption="Houses and their cartons">
      <THead>
        <tr>
          <Th>House</Th>
          <Th numeric>Qty</Th>
          <Th>Carton (in)</Th>
          <Th numeric>Weight</Th>
          <Th numeric>Billable each</Th>
        </tr>
      </THead>
      <TBody>
        {lines.map((line) => {
          const { carton, billable } = line;
          const { lengthIn, widthIn, heightIn } = billable.roundedDims;
          return (
            <Tr key={line.id}>
              <Td className="font-bold">{line.name}</Td>
              <Td numeric>{line.quantity}</Td>
              <Td className="whitespace-nowrap">
                {inches(carton.lengthIn)} × {inches(carton.widthIn)} × {inches(carton.heightIn)}
                <span className="block text-sm text-ink-soft">
                  {Math.round(carton.lengthIn * 2.54)} × {Math.round(carton.widthIn * 2.54)} × {Math.round(carton.heightIn * 2.54)} cm
                </span>
              </Td>
              <Td numeric className="whitespace-nowrap">
                {carton.weightLb} lb
                <span className="block text-sm text-ink-soft">{(carton.weightLb * 0.45359237).toFixed(1)} kg</span>
              </Td>
              <Td numeric className="whitespace-nowrap">
                <span className="font-bold">{billable.billableLb} lb</span>
                <span className="block text-sm text-ink-soft">
                  {billable.dimLb > billable.actualLb
                    ? `size: ${lengthIn}×${widthIn}×${heightIn} ÷ ${DIM_DIVISOR_CUBIC_IN_PER_LB}`
                    : `weight: ${billable.actualLb} lb`}
                </span>
              </Td>
            </Tr>
          );
        })}
      </TBody>
    </Table>
  );
}
