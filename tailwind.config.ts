import type { Config } from "tailwindcss";

// Spanlark's palette and type (see DESIGN.md). Loaded from app/globals.css with @config.
// Contrast (WCAG 2 ratio) for reading in sunlight: every text color is 7:1 or better (AAA) on every paper it sits on
// (paper, raised, sunk and the light tints); tests/components/ui/contrast.test.ts computes each pair from these values.
// On paper #F7F5EF: ink 16.2, ink-soft 12.2, graphite 8.2, spruce 8.2, white on spruce 9.0, white on over 7.5.
// The state colors (sound, over, caution) fill icons, bars and borders; words in a state use the darker "-ink"
// shades (7.0 to 8.2). Body text is ink; graphite for hints and secondary text.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#F7F5EF", raised: "#FFFFFF", sunk: "#EEEBE2" },
        ink: { DEFAULT: "#15191E", soft: "#2A3038" },
        graphite: "#434A56",
        rule: { DEFAULT: "#D8D4C8", strong: "#A8A292" },
        spruce: { DEFAULT: "#1A5247", dark: "#14423A", light: "#E3EFEB" },
        amber: { DEFAULT: "#B7791F", dark: "#8A5A12", light: "#FBEFD9" },
        sound: { DEFAULT: "#1F7A3A", ink: "#145C2B", bg: "#E4F3E8" },
        over: { DEFAULT: "#A3221B", ink: "#8F1D17", bg: "#FBE7E5" },
        caution: { DEFAULT: "#8A5A00", ink: "#6B4600", bg: "#FFF4D6" },
        focus: "#0B57D0",
      },
      fontFamily: {
        sans: ["var(--font-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-mono)", "ui-monospace", "monospace"],
      },
      fontSize: {
        sm: ["1rem", { lineHeight: "1.5rem" }],
        base: ["1.0625rem", { lineHeight: "1.625rem" }],
        xs: ["0.9375rem", { lineHeight: "1.375rem" }],
      },
      minHeight: { touch: "44px", "touch-lg": "56px" },
      minWidth: { touch: "44px" },
      height: { touch: "44px", "touch-lg": "56px" },
      spacing: { "bottom-nav": "4.5rem" },
      borderRadius: { card: "0.75rem" },
      boxShadow: { bar: "0 -2px 10px rgba(21, 25, 30, 0.10)" },
    },
  },
};

export default config;
