import type { MigrationContext } from "@/lib/db/migrator";

// Members saved before the load basis was a choice were worked out on ASCE 7-22 (ground snow counted at 0.7S).
// Record that basis in each saved member's inputs and answer, so their numbers stay as saved and the job page
// can offer a re-check on the new default (ASCE 7-16). Job sheets are snapshots and are left untouched.
export async function up({ context: { sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.query(`
    UPDATE members
       SET flow_state = jsonb_set(flow_state, '{loadStandard}', '"ASCE 7-22"'),
           result_summary = CASE WHEN result_summary IS NULL OR jsonb_typeof(result_summary) <> 'object' THEN result_summary
                                 ELSE jsonb_set(result_summary, '{loadStandard}', '"ASCE 7-22"') END
     WHERE NOT (flow_state ? 'loadStandard')
  `);
}

// Back to members without a recorded basis: the earlier code reads every member as ASCE 7-22.
export async function down({ context: { sequelize } }: { context: MigrationContext }): Promise<void> {
  await sequelize.query(`
    UPDATE members
       SET flow_state = flow_state - 'loadStandard',
           result_summary = CASE WHEN result_summary IS NULL OR jsonb_typeof(result_summary) <> 'object' THEN result_summary
                                 ELSE result_summary - 'loadStandard' END
     WHERE flow_state->>'loadStandard' = 'ASCE 7-22'
  `);
}
