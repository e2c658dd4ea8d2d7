/**
 * What a member is in the building: the design input's optional `kind`. It sets defaults the
 * standards leave to the use (the repetitive member factor for joists and rafters, incised treated
 * lumber for deck members, the wall a header must fit) and tells the answer what to build.
 */
export const MEMBER_KINDS = ["floor-joist", "header", "beam", "deck-joist", "deck-beam", "rafter"] as const;
export type MemberKind = (typeof MEMBER_KINDS)[number];

/** Joists and rafters: members at a spacing sharing the load through sheathing. */
export const REPETITIVE_KINDS: readonly MemberKind[] = ["floor-joist", "deck-joist", "rafter"];
/** Deck members: outdoors, treated lumber, wet service. */
export const DECK_KINDS: readonly MemberKind[] = ["deck-joist", "deck-beam"];
/** Members that sit in a stud wall and must fit its thickness. */
export const WALL_KINDS: readonly MemberKind[] = ["header"];

/** Stud walls a header or beam sits in, and the depth of their studs (in): a 2x4 wall is 3-1/2 in, a 2x6 wall 5-1/2 in. */
export const WALL_FRAMINGS = ["2x4", "2x6"] as const;
export type WallFraming = (typeof WALL_FRAMINGS)[number];
export const WALL_DEPTH_IN: Readonly<Record<WallFraming, number>> = { "2x4": 3.5, "2x6": 5.5 };
export const DEFAULT_WALL_FRAMING: WallFraming = "2x4";

export const KIND_LABELS: Readonly<Record<MemberKind, string>> = {
  "floor-joist": "Floor joist",
  header: "Header",
  beam: "Beam or girder",
  "deck-joist": "Deck joist",
  "deck-beam": "Deck beam",
  rafter: "Rafter or ceiling joist",
};

/** Members that carry a roof: their deflection limits are the roof and ceiling rows. */
export const ROOF_KINDS: readonly MemberKind[] = ["rafter"];

/**
 * What else a job holds on its load path: posts (or stud columns) under a beam and the footings under
 * them. They are checked in axial compression and for the soil (lib/solver/design/post.ts, footing.ts),
 * not by the member flow, so they are kinds of a job's member but not of the design input.
 */
export const SUPPORT_KINDS = ["post", "footing"] as const;
export type SupportKind = (typeof SUPPORT_KINDS)[number];
export const JOB_MEMBER_KINDS = [...MEMBER_KINDS, ...SUPPORT_KINDS] as const;
export type JobMemberKind = (typeof JOB_MEMBER_KINDS)[number];
export const SUPPORT_KIND_LABELS: Readonly<Record<SupportKind, string>> = { post: "Posts", footing: "Footings" };

/** "Deck beam", "Posts", "Footings": the label of any kind of a job's member. */
export function jobKindLabel(kind: JobMemberKind): string {
  return kind === "post" || kind === "footing" ? SUPPORT_KIND_LABELS[kind] : KIND_LABELS[kind];
}

/** A kind the sizing flow works out (not a post or footing). */
export function isFramingKind(kind: JobMemberKind): kind is MemberKind {
  return (MEMBER_KINDS as readonly string[]).includes(kind);
}
