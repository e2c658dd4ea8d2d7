import { formatDollars, formatStockLength, type OrderList } from "@/lib/orders/order-list";

export type OrderListViewProps = {
  list: OrderList;
};

/**
 * The order list as a yard reads it: one block per species and grade (or product), a line per size and
 * length with the quantity, what it is for and its price. A line without a price says so in words.
 */
export function OrderListView({ list }: OrderListViewProps) {
  return (
    <div className="flex flex-col gap-5" data-testid="order-list">
      {list.missing.length > 0 ? (
        <section aria-labelledby="order-missing" className="rounded-card border-2 border-caution bg-caution-bg p-4 text-ink">
          <h2 id="order-missing" className="text-lg font-bold text-caution-ink">
            Not counted yet
          </h2>
          <ul className="mt-1 flex list-disc flex-col gap-1 pl-6">
            {list.missing.map((m) => (
              <li key={m}>{m}</li>
            ))}
          </ul>
        </section>
      ) : null}
      {list.groups.length === 0 ? <p className="text-lg">Nothing to order yet: size a member and save it to this job.</p> : null}
      {list.groups.map((group) => (
        <section key={group.name} aria-label={group.name} className="order-keep flex flex-col gap-2">
          <h2 className="text-xl font-bold">{group.name}</h2>
          <table className="w-full border-collapse text-left tabular-nums">
            <thead className="sr-only sm:not-sr-only">
              <tr className="border-b-2 border-rule text-sm text-graphite">
                <th scope="col" className="py-1 pr-2">
                  Size
                </th>
                <th scope="col" className="py-1 pr-2 text-right">
                  Length
                </th>
                <th scope="col" className="py-1 pr-2 text-right">
                  Qty
                </th>
                <th scope="col" className="hidden py-1 pr-2 sm:table-cell">
                  For
                </th>
                <th scope="col" className="py-1 text-right">
                  Price
                </th>
              </tr>
            </thead>
            <tbody>
              {group.lines.map((line, i) => (
                <tr key={`${line.item}-${line.lengthFt}-${line.unit}-${i}`} className="border-b border-rule align-top" data-testid="order-line">
                  <td className="py-2 pr-2">
                    <span className="text-lg font-bold">{line.item}</span>
                    {line.uses.map((use) => (
                      <span key={use} className="block text-sm text-ink sm:hidden">
                        {use}
                      </span>
                    ))}
                    {line.notes.map((note) => (
                      <span key={note} className="mt-1 block text-sm text-ink-soft">
                        {note}
                      </span>
                    ))}
                  </td>
                  <td className="py-2 pr-2 text-right text-lg whitespace-nowrap">{formatStockLength(line.lengthFt)}</td>
                  <td className="py-2 pr-2 text-right text-lg font-bold whitespace-nowrap">
                    {line.quantity} <span className="text-sm font-normal">{line.unit}</span>
                  </td>
                  <td className="hidden py-2 pr-2 text-ink-soft sm:table-cell">
                    {line.uses.map((use) => (
                      <span key={use} className="block">
                        {use}
                      </span>
                    ))}
                  </td>
                  <td className="py-2 text-right whitespace-nowrap">
                    {line.price !== null ? (
                      <span className="text-lg">{formatDollars(line.price)}</span>
                    ) : (
                      <span className="text-sm font-bold text-caution-ink" data-testid="unpriced">
                        No price
                      </span>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="text-right text-ink-soft">
            {group.unpriced === group.lines.length
              ? `${group.name}: no prices on file`
              : `${group.name}: ${formatDollars(group.subtotal)}${group.unpriced > 0 ? ` + ${group.unpriced} unpriced` : ""}`}
          </p>
        </section>
      ))}
      {list.groups.length > 0 ? (
        <p className="rounded-card border-2 border-ink bg-paper-raised p-4 text-xl font-bold" data-testid="order-total">
          Priced total {formatDollars(list.total)}
          {list.unpriced > 0 ? (
            <span className="block text-base font-normal">
              {list.unpriced} line{list.unpriced === 1 ? " has" : "s have"} no price in the cost table: ask the yard.
            </span>
          ) : null}
        </p>
      ) : null}
      <p className="text-ink-soft">
        Each piece is rounded up to a stock length; jack and king studs (two king studs each end), rims at both ends of joists, a row of blocking at least every
        8 ft and 10% extra concrete follow common practice. Check the list against the plans before you order.
      </p>
    </div>
  );
}
