/**
 * A job's order list from its saved members: the framing members counted by their answers, the posts and
 * footings built in the load path by their design, and the post and footing numbers typed on a beam only for
 * the supports not built there. Pure: the saved members and the tables in, the list out.
 */
import { designSpecOf } from "@/lib/flow/summary";
import type { PathMember } from "@/lib/jobs/load-path";
import type { MaterialTables } from "@/lib/tables/types";
import { loadPathSupports } from "./load-path-supports";
import { buildOrderList, type OrderDetails, type OrderList, type OrderOptions } from "./order-list";

export interface JobOrderMember extends PathMember {
  orderDetails: OrderDetails;
}

export function jobOrderList(members: readonly JobOrderMember[], tables: MaterialTables, options: Omit<OrderOptions, "supports"> = {}): OrderList {
  const built = loadPathSupports(members);
  return buildOrderList(
    members.flatMap((m) =>
      m.flowState === null || m.kind === "post" || m.kind === "footing"
        ? []
        : [
            {
              label: m.label,
              kind: m.kind,
              flowState: m.flowState,
              spec: m.chosenMember ?? designSpecOf(m.resultSummary),
              summary: m.resultSummary,
              details: m.orderDetails,
              builtUnder: built.builtUnder.get(m.id),
            },
          ],
    ),
    tables,
    { ...options, supports: built.supports },
  );
}
