import type { Config } from "tailwindcss";

// Loopwright's own palette: warm drafting paper, graphite ink, a deep petrol "signal" for actions,
// an amber "trace" reserved for focus and highlights, brick red for faults.
export default {
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f5f3ee", raised: "#fcfbf8", sunk: "#ebe8e0" },
        ink: { DEFAULT: "#1e2530", soft: "#4d5663", faint: "#737b86" },
        rule: { DEFAULT: "#d8d3c7", strong: "#b9b2a3" },
        signal: { DEFAULT: "#1d5c63", strong: "#134349", tint: "#e1ecec" },
        trace: { DEFAULT: "#d4891c", tint: "#f8ecd6" },
        fault: { DEFAULT: "#a23a2c", tint: "#f6e2dd" },
        steady: { DEFAULT: "#3d6b3f", tint: "#e3eedf" },
      },
      fontFamily: {
        sans: ['"IBM Plex Sans"', "system-ui", "sans-serif"],
        mono: ['"IBM Plex Mono"', "ui-monospace", "monospace"],
      },
    },
  },
} satisfies Config;
