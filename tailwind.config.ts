import type { Config } from "tailwindcss";

// Bellows' own palette: a slate-blue ink on a paper-white ground, with a
// single copper accent; issue colours are chosen for contrast, not copied.
export default {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: "#1d2a3a", soft: "#4a5a6e", faint: "#8b98a8" },
        paper: { DEFAULT: "#f7f8f6", raised: "#ffffff", sunk: "#eceee9" },
        copper: { DEFAULT: "#b4652b", dark: "#8f4d1e", light: "#f3e3d4" },
        line: "#d8dcd6",
        good: "#2f7d55",
        warn: "#b7791f",
        bad: "#b23a3a",
      },
      fontFamily: { sans: ["var(--font-sans)", "system-ui", "sans-serif"] },
    },
  },
} satisfies Config;
