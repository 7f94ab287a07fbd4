import type { ParcelRow } from "@/db/schema";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import { formatStoreDateTime } from "@/lib/fulfillment/store-time";
import { CARRIER_LABELS, isCarrier, validateTrackingNumber } from "@/lib/fulfillment/tracking";

/** The boxes on record, with each one's tracking link once it has left. */
export function BoxesTable({ boxes }: { boxes: ParcelRow[] }) {
  return (
    <Table caption="Boxes">
      <THead>
        <tr>
          <Th>Box</Th>
          <Th>Size (in)</Th>
          <Th numeric>Weight</Th>
          <Th numeric>Billable</Th>
          <Th>Carrier and tracking</Th>
        </tr>
      </THead>
      <TBody>
        {boxes.map((box, index) => {
          const carrier = box.carrier && isCarrier(box.carrier) ? box.carrier : null;
          const check = carrier && box.trackingNumber ? validateTrackingNumber({ carrier, number: box.trackingNumber }) : null;
          return (
            <Tr key={box.id}>
              <Td>
                <span className="font-bold">Box {index + 1}</span>
                <span className="block text-sm">{box.description}</span>
              </Td>
              <Td className="whitespace-nowrap">
                {box.lengthIn} × {box.widthIn} × {box.heightIn}
              </Td>
              <Td numeric>{box.weightLb} lb</Td>
              <Td numeric className="font-bold">{box.billableLb} lb</Td>
              <Td>
                {carrier && box.trackingNumber ? (
                  <>
                    {CARRIER_LABELS[carrier]} {box.service}
                    <span className="block font-mono text-sm break-all">
                      {check?.ok && check.url ? (
                        <a href={check.url} target="_blank" rel="noopener noreferrer">
                          {box.trackingNumber}
                          <span className="sr-only"> (opens the carrier&apos;s tracking page)</span>
                        </a>
                      ) : (
                        box.trackingNumber
                      )}
                    </span>
                    {box.shippedAt ? <span className="block text-sm text-ink-soft">{formatStoreDateTime(box.shippedAt)}</span> : null}
                  </>
                ) : (
                  <span className="text-ink-soft">Not handed to a carrier yet</span>
                )}
              </Td>
            </Tr>
          );
        })}
      </TBody>
    </Table>
  );
}
