import { randomUUID } from "node:crypto";
import { QueryTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";
import { defaultFlowState } from "@/lib/flow/defaults";
import { checkRequest, sizeRequest } from "@/lib/flow/request";
import { withMainSpan, withOverhang, type FlowState } from "@/lib/flow/state";
import { summarize } from "@/lib/flow/summary";
import { checkMember, sizeMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";

// The invented jobs of the demo scenario (Hollis & Rowe Framing, Larkfield), each owned by the demo subscriber
// (Sam) and the demo builder (Dee) as their own copies, with a few members sized now from the starter tables.
const OWNERS = ["sam@hollisrowe.test", "dee@hollisrowe.test"];

/** What the order list needs: the floor or deck width the joists repeat across; posts and footings under a deck beam. */
type DemoDetails = { runWidthFt?: number; postHeightFt?: number; postSize?: string; footingDiameterIn?: number; footingDepthIn?: number };
type DemoMember = { key: string; label: string; state: FlowState; carriedBy?: string; details?: DemoDetails };

const engineered = (state: FlowState): FlowState => ({ ...state, material: { ...state.material, family: "engineered", plies: 0, product: "" } });

function demoMembers(job: "marsh" | "orchard"): DemoMember[] {
  if (job === "marsh") {
    return [
      { key: "h1", label: "H1 kitchen header", state: withMainSpan(defaultFlowState("header"), 8) },
      // 14 ft carrying 12 ft of floor: past what 2x plies do, so an engineered beam (LVL or glulam)
      { key: "b1", label: "B1 family room beam", state: engineered(withMainSpan(defaultFlowState("beam"), 14)) },
      { key: "j1", label: "J1 addition floor joists", state: withMainSpan(defaultFlowState("floor-joist"), 13.5), details: { runWidthFt: 16 } },
    ];
  }
  return [
    {
      key: "db1",
      label: "DB1 deck beam",
      state: defaultFlowState("deck-beam"),
      details: { postHeightFt: 4, postSize: "6x6", footingDiameterIn: 12, footingDepthIn: 36 },
    },
    {
      key: "dj1",
      label: "DJ1 deck joists",
      state: withOverhang(withMainSpan(defaultFlowState("deck-joist"), 11), "right", 1.5),
      carriedBy: "db1",
      details: { runWidthFt: 12 },
    },
  ];
}

const JOBS = [
  {
    key: "marsh" as const,
    name: "Marsh Lane addition",
    siteAddress: "14 Marsh Lane, Larkfield",
    notes: "One-story kitchen and family room addition on the north side.",
  },
  {
    key: "orchard" as const,
    name: "Orchard Row deck",
    siteAddress: "7 Orchard Row, Larkfield",
    notes: "Ground-level deck off the back door, treated Southern Pine.",
  },
];

export async function up({ context: { sequelize } }: { context: MigrationContext }): Promise<void> {
  const now = new Date();
  for (const email of OWNERS) {
    const [owner] = await sequelize.query<{ id: string }>("SELECT id FROM users WHERE email = :email", { replacements: { email }, type: QueryTypes.SELECT });
    if (!owner) continue;
    for (const job of JOBS) {
      const [existing] = await sequelize.query<{ id: string }>("SELECT id FROM jobs WHERE owner_id = :owner AND name = :name", {
        replacements: { owner: owner.id, name: job.name },
        type: QueryTypes.SELECT,
      });
      if (existing) continue;
      const jobId = randomUUID();
      await sequelize.query(
        "INSERT INTO jobs (id, owner_id, name, site_address, notes, created_at, updated_at) VALUES (:id, :owner, :name, :address, :notes, :now, :now)",
        { replacements: { id: jobId, owner: owner.id, name: job.name, address: job.siteAddress, notes: job.notes, now }, type: QueryTypes.INSERT },
      );
      const ids = new Map<string, string>();
      const members = demoMembers(job.key);
      for (const [order, m] of members.entries()) {
        const best = sizeMember(sizeRequest(m.state), STARTER_TABLES).passing[0]?.member ?? null;
        const summary = best ? summarize(m.state, checkMember(checkRequest(m.state, best), STARTER_TABLES), now) : null;
        const id = randomUUID();
        ids.set(m.key, id);
        await sequelize.query(
          `INSERT INTO members (id, job_id, label, kind, flow_state, result_summary, chosen_member, carried_by_member_id, sort_order, created_at, updated_at,
             run_width_ft, post_height_ft, post_size, footing_diameter_in, footing_depth_in)
           VALUES (:id, :jobId, :label, :kind, :flowState, :summary, :chosen, :carriedBy, :order, :now, :now,
             :runWidthFt, :postHeightFt, :postSize, :footingDiameterIn, :footingDepthIn)`,
          {
            replacements: {
              id,
              jobId,
              label: m.label,
              kind: m.state.kind,
              flowState: JSON.stringify(m.state),
              summary: summary ? JSON.stringify(summary) : null,
              chosen: best ? JSON.stringify(best) : null,
              carriedBy: m.carriedBy ? (ids.get(m.carriedBy) ?? null) : null,
              order,
              now,
              runWidthFt: m.details?.runWidthFt ?? null,
              postHeightFt: m.details?.postHeightFt ?? null,
              postSize: m.details?.postSize ?? null,
              footingDiameterIn: m.details?.footingDiameterIn ?? null,
              footingDepthIn: m.details?.footingDepthIn ?? null,
            },
            type: QueryTypes.INSERT,
          },
        );
      }
    }
  }
}

export async function down({ context: { sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.query("DELETE FROM jobs WHERE name IN (:names) AND owner_id IN (SELECT id FROM users WHERE email IN (:emails))", {
    replacements: { names: JOBS.map((j) => j.name), emails: OWNERS },
    type: QueryTypes.DELETE,
  });
}
