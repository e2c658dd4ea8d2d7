/** The kinds of member Spanlark sizes: one list for the design input, the flow, the crew link and the sheet. */
export const MEMBER_KINDS = ["floor-joist", "header", "beam", "deck-joist", "deck-beam", "rafter"] as const;
export type MemberKind = (typeof MEMBER_KINDS)[number];

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
