import type { Config } from "tailwindcss";

// Wickmark's own palette: deep "ink" blues for structure, a warm "wick" amber for action,
// and a "paper" background. Contrast pairs used in the UI meet WCAG AA for body text.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        ink: { 50: "#f2f5f9", 100: "#e1e8f0", 200: "#c3d0df", 400: "#6a7f98", 600: "#3b4f68", 800: "#1d2b3d", 900: "#121c29" },
        wick: { 100: "#fbecd3", 300: "#f0bd6b", 500: "#c7791b", 600: "#a86212", 700: "#874d0c" },
        paper: "#faf8f4",
        ok: { 100: "#dcefe3", 700: "#1f6b3d" },
        bad: { 100: "#f8dcdc", 700: "#a12727" },
      },
      fontFamily: { sans: ["Noto Sans", "system-ui", "sans-serif"] },
    },
  },
};

export default config;
