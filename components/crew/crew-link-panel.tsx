import { Card } from "@/components/ui/card";
import { getSessionUser } from "@/lib/auth/session";
import { countActiveCrewLinks, listCrewLinks } from "@/lib/crew/links";
import { crewQrSvg } from "@/lib/crew/qr";
import { getPlanLimits } from "@/lib/payments/subscriptions";
import { CrewLinkManager } from "./crew-link-manager";

export type CrewLinkPanelProps = {
  jobId: string;
  jobName: string;
};

/** The job page's crew link section (server): the owner's links for this job and the free-tier count. */
export async function CrewLinkPanel({ jobId, jobName }: CrewLinkPanelProps) {
  const user = await getSessionUser();
  if (!user) return null;
  const [links, limits, activeCount] = await Promise.all([listCrewLinks(user.id, jobId), getPlanLimits(user), countActiveCrewLinks(user.id)]);
  const live = links.filter((l) => l.status === "active" && l.url);
  const qrSvgs = Object.fromEntries(await Promise.all(live.map(async (l) => [l.id, await crewQrSvg(l.url as string)] as const)));
  return (
    <Card title="Crew link" aria-label="Crew link">
      <CrewLinkManager jobId={jobId} jobName={jobName} links={links} activeLimit={limits.activeCrewLinks} activeCount={activeCount} qrSvgs={qrSvgs} />
    </Card>
  );
}
