import { formatOrderNumber } from "@/lib/checkout/order-number";
import type { CenterDetails } from "@/lib/fulfillment/queries/center";
import type { FulfillmentOrder } from "@/lib/fulfillment/queries/order-detail";
import { formatStoreDate } from "@/lib/fulfillment/store-time";

// What goes in the box: what should be inside, where the install guide is, the safety
// cautions PRODUCT.md §7 asks for wherever we tell someone to climb or mount, and our thanks.
// No prices: the slip may travel with a gift.

type Props = { detail: FulfillmentOrder; center: CenterDetails | null };

export function PackingSlip({ detail, center }: Props) {
  const { order, lines, boxes } = detail;
  const ship = order.shipTo;
  const houses = lines.reduce((n, l) => n + l.quantity, 0);
  return (
    <article className="mx-auto flex max-w-3xl flex-col gap-6 rounded-2xl border border-paper-300 bg-white p-6 text-ink print:max-w-none print:rounded-none print:border-0 print:p-0">
      <div className="grid items-start gap-4 border-b-2 border-moss-800 pb-4 sm:grid-cols-[1fr_auto] print:grid-cols-[1fr_auto]">
        <div>
          <p className="font-display text-2xl font-semibold text-moss-900">{center?.name ?? "Roostwright"}</p>
          {center ? (
            <p className="text-sm">
              {center.street}, {center.city}, {center.state} {center.zip} · {center.phone} · {center.email}
            </p>
          ) : null}
        </div>
        <div className="sm:text-right print:text-right">
          <h1 className="font-display text-2xl font-semibold">Packing slip</h1>
          <p className="font-bold">Order {formatOrderNumber(order.number)}</p>
          {order.paidAt ? <p className="text-sm">Ordered {formatStoreDate(order.paidAt)}</p> : null}
        </div>
      </div>

      <div className="grid gap-4 sm:grid-cols-2 print:grid-cols-2">
        <section>
          <h2 className="text-sm font-bold tracking-wide text-ink-soft uppercase">{order.method === "pickup" ? "Collected by" : "Ship to"}</h2>
          {order.method === "parcel" && ship ? (
            <address className="not-italic">
              {ship.name}
              <br />
              {ship.line1}
              {ship.line2 ? <><br />{ship.line2}</> : null}
              <br />
              {ship.city}, {ship.state} {ship.zip}
            </address>
          ) : (
            <p>{order.name} (local pickup at the front desk)</p>
          )}
        </section>
        <section>
          <h2 className="text-sm font-bold tracking-wide text-ink-soft uppercase">In this order</h2>
          <p>
            {houses} {houses === 1 ? "house" : "houses"}
            {boxes.length > 0 ? ` in ${boxes.length} ${boxes.length === 1 ? "box" : "boxes"}` : ""}
          </p>
        </section>
      </div>

      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Houses in this order</caption>
        <thead>
          <tr className="border-b border-ink">
            <th scope="col" className="py-2 pr-4">House</th>
            <th scope="col" className="py-2 pr-4 text-right">Qty</th>
            <th scope="col" className="py-2">Packed</th>
          </tr>
        </thead>
        <tbody>
          {lines.map((line) => (
            <tr key={line.id} className="border-b border-paper-300">
              <td className="py-2 pr-4 font-bold">{line.name}</td>
              <td className="py-2 pr-4 text-right tabular-nums">{line.quantity}</td>
              <td className="py-2">
                <span aria-hidden="true" className="inline-block size-5 border-2 border-ink align-middle" />
                <span className="sr-only">Tick when packed</span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>

      {boxes.length > 1 ? (
        <section>
          <h2 className="text-sm font-bold tracking-wide text-ink-soft uppercase">Boxes</h2>
          <ol className="list-decimal pl-5">
            {boxes.map((box, i) => (
              <li key={box.id}>
                Box {i + 1} of {boxes.length}: {box.description}
              </li>
            ))}
          </ol>
        </section>
      ) : null}

      <section className="rounded-xl border-2 border-moss-700 p-4">
        <h2 className="text-lg font-bold text-moss-900">Your install guide</h2>
        <p>
          Your install guide, written for your house, your summers and your site, is in the e-mail we sent to{" "}
          <span className="font-bold [overflow-wrap:anywhere]">{order.email}</span> when you paid, and on your order page. Read it
          before you choose the spot: sun, height and a clear flight path decide whether bats move in.
        </p>
      </section>

      <section>
        <h2 className="text-lg font-bold">Before you put it up</h2>
        <ul className="list-disc pl-5 text-sm leading-relaxed">
          <li>Never touch a bat with bare hands. Bats can carry rabies: after any bite or scratch, wash it, see a doctor and call your local health department.</li>
          <li>Work from a ladder or raise a pole with two people, well away from power lines.</li>
          <li>In the U.S., call 811 before digging a pole hole.</li>
          <li>Once bats move in, don&apos;t open or move the house in the maternity season (roughly April to mid-August in much of the U.S.; state rules differ). Do upkeep in winter, when it is empty.</li>
          <li>Local codes, permits, HOA rules and licensed trades come first.</li>
          <li>Be patient: bats may take months, or up to two summers, to move in. Still empty after two summers? Move it somewhere sunnier, or darken it.</li>
        </ul>
      </section>

      <p className="border-t border-paper-300 pt-4 text-center font-display text-lg text-moss-900">
        Thank you. Every house you buy pays for the care of injured and orphaned bats at {center?.name ?? "the center"}, and gives a
        colony a safe place to raise its young.
      </p>
    </article>
  );
}
