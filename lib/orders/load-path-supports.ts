/**
 * The posts and footings a job's load path builds, as the order list counts them: one post under each
 * support of each member standing on a post member, one footing under each of those posts, each named by
 * the member and support it stands under, with the design and the verdict of its check as saved (the
 * load path worked them out when the job last changed). Also, for each framing member, how many of its
 * supports stand on built posts and footings, so the order list does not count those again from the
 * numbers typed on the member. Pure: the saved members in, plain data out.
 */
import { formatFeetInches } from "@/lib/flow/length";
import type { FootingSpec } from "@/lib/flow/summary";
import { bearingSupports, type PathMember, type PostDesign } from "@/lib/jobs/load-path";

/** Where one post or footing stands: under "B1 deck beam" at "8' 0"" from its left end. */
export interface SupportPlace {
  /** the member it stands under (a post stands under a beam; a footing under a post, named by the post's member) */
  under: string;
  /** the support's position on the member above, ft from its left end ("8' 0""); a footing under posts: "P1 deck posts (B1 deck beam)" at the post's position */
  at: string;
}

interface BuiltBase {
  /** the post or footing member's name on the job: "P1 deck posts" */
  label: string;
  /** one entry per post or footing */
  places: SupportPlace[];
  /** the saved verdict of its check; null when it has not been worked out (nothing bears on it, or its inputs were refused) */
  pass: boolean | null;
  /** why it fails, in the check's words */
  problems: string[];
}

export interface BuiltPosts extends BuiltBase {
  type: "post";
  design: Omit<PostDesign, "type">;
}

export interface BuiltFootings extends BuiltBase {
  type: "footing";
  /** the footing as the load path sized it; null before it was worked out */
  spec: FootingSpec | null;
}

export type BuiltSupport = BuiltPosts | BuiltFootings;

/** How many supports of a framing member stand on posts, and on footings, built in the load path. */
export interface BuiltUnder {
  posts: number;
  footings: number;
}

export interface LoadPathOrder {
  supports: BuiltSupport[];
  /** by framing member id */
  builtUnder: Map<string, BuiltUnder>;
}

interface PostPlace extends SupportPlace {
  memberId: string;
}

/** The posts of a post member, in the order the load path checks them (the members bearing on it, then their supports). */
function postPlaces(post: PathMember, members: readonly PathMember[]): PostPlace[] {
  const places: PostPlace[] = [];
  for (const b of members) {
    if (b.carriedByMemberId !== post.id || !b.resultSummary) continue;
    for (const j of bearingSupports(b, "post")) {
      const r = b.resultSummary.reactions[j];
      if (!r?.byCase) continue;
      places.push({ under: b.label, at: formatFeetInches(r.x), memberId: b.id });
    }
  }
  return places;
}

/** Reads the built posts and footings off a job's saved members. */
export function loadPathSupports(members: readonly PathMember[]): LoadPathOrder {
  const supports: BuiltSupport[] = [];
  const builtUnder = new Map<string, BuiltUnder>();
  const under = (id: string): BuiltUnder => {
    const held = builtUnder.get(id) ?? { posts: 0, footings: 0 };
    builtUnder.set(id, held);
    return held;
  };
  const byId = new Map(members.map((m) => [m.id, m]));
  for (const m of members) {
    const summary = m.resultSummary;
    if (m.supportDesign?.type === "post") {
      const places = postPlaces(m, members);
      const onFooting = m.carriedByMemberId !== null && byId.get(m.carriedByMemberId)?.supportDesign?.type === "footing";
      for (const p of places) {
        under(p.memberId).posts += 1;
        if (onFooting) under(p.memberId).footings += 1;
      }
      const { type: _type, ...design } = m.supportDesign;
      supports.push({
        type: "post",
        label: m.label,
        design,
        places: places.map(({ under: u, at }) => ({ under: u, at })),
        pass: summary ? summary.pass : null,
        problems: summary?.problems ?? [],
      });
    } else if (m.supportDesign?.type === "footing") {
      const places: SupportPlace[] = [];
      for (const p of members) {
        if (p.carriedByMemberId !== m.id || p.supportDesign?.type !== "post") continue;
        const own = postPlaces(p, members);
        const count = p.resultSummary?.reactions.length ?? 0;
        for (let i = 0; i < count; i++)
          places.push(own[i] ? { under: `${p.label} (${own[i].under})`, at: own[i].at } : { under: p.label, at: `post ${i + 1}` });
      }
      const spec = summary?.spec.material === "footing" ? summary.spec : null;
      supports.push({
        type: "footing",
        label: m.label,
        spec,
        places,
        pass: summary && spec ? summary.pass : null,
        problems: summary?.problems ?? [],
      });
    }
  }
  return { supports, builtUnder };
}
