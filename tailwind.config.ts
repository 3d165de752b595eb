import type { Config } from "tailwindcss";

// Stopwright's palette: a builder's drawing office (see DEVELOPERS.md, "Look").
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f7f4ec", deep: "#efe9dc", card: "#fffdf8" },
        ink: { DEFAULT: "#1d2433", soft: "#3a4356" },
        tin: { DEFAULT: "#6b737d", light: "#8a929c", rule: "#d9d3c4" },
        brass: { DEFAULT: "#b0852f", dark: "#8a6622", light: "#e9d9b3" },
        oak: "#7a5230",
        fit: { DEFAULT: "#2f6b4f", light: "#dcebe2" },
        clash: { DEFAULT: "#c2412d", light: "#f6ddd7" },
        caution: { DEFAULT: "#9a6518", light: "#f5e6c8" },
      },
      fontFamily: {
        sans: ["var(--font-inter)", "DejaVu Sans", "Liberation Sans", "sans-serif"],
        serif: ["var(--font-serif)", "DejaVu Serif", "Liberation Serif", "serif"],
      },
    },
  },
};

export default config;
