// Drawing colors from DESIGN.md, as literal values so the SVG draws the same on screen, in print and in a PDF.
export const INK = {
  paper: "#FFFFFF",
  grid: "#E6E2D6",
  rule: "#D8D4C8",
  ruleStrong: "#A8A292",
  ink: "#15191E",
  graphite: "#5A6270",
  spruce: "#1E5B4F",
  spruceLight: "#E3EFEB",
  amber: "#B7791F",
  amberDark: "#8A5A12",
  amberLight: "#FBEFD9",
} as const;
