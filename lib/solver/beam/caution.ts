/** The product's caution (docs: /work/shared/DESIGN.md), carried by every result. */
export const CAUTION =
  "Preliminary sizing for typical house framing. Check loads, spans and supports on site. Your local building code and building official govern; have a licensed engineer review anything unusual — long spans, heavy point loads, steel, or anything this tool does not check (connections, fasteners, posts, footings, lateral loads).";

/** What a beam analysis on its own does not check. */
export const NOT_CHECKED =
  "This is the analysis of a straight beam with constant EI (shear deformation, axial load and the member's strength are not included); it does not check the member, bearing, connections, fasteners, posts, footings or lateral loads.";
