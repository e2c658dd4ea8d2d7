import { Card } from "@/components/ui/card";
import { getSessionUser } from "@/lib/auth/session";
import { countActiveCrewLinks, listCrewLinks } from "@/lib/crew/links";
import { getPlanLimits } from "@/lib/payments/subscriptions";
import { CrewLinkManager } from "./crew-link-manager";

export type CrewLinkPanelProps = {
  jobId: string;
};

/** The job page's crew link section (server): the owner's links for this job and the free-tier count. */
export async function CrewLinkPanel({ jobId }: CrewLinkPanelProps) {
  const user = await getSessionUser();
  if (!user) return null;
  const [links, limits, activeCount] = await Promise.all([listCrewLinks(user.id, jobId), getPlanLimits(user), countActiveCrewLinks(user.id)]);
  return (
    <Card title="Crew link" aria-label="Crew link">
      <CrewLinkManager jobId={jobId} links={links} activeLimit={limits.activeCrewLinks} activeCount={activeCount} />
    </Card>
  );
}
