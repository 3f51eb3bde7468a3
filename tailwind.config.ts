import type { Config } from "tailwindcss";

// Caryatid's palette: a warm limestone ground, slate ink, and a single oxide accent for actions.
// Pass / fail use words and icons first; colour only reinforces them.
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        stone: { 25: "#fbfaf7", 50: "#f6f4ee", 100: "#ece8dd", 200: "#dcd5c4", 300: "#c3b9a2" },
        ink: { 500: "#56606b", 700: "#333c46", 900: "#1b2129" },
        oxide: { 500: "#b4532a", 600: "#9a4421", 700: "#7d361a" },
        sound: { 600: "#2f6b4f" },
        strained: { 600: "#a8321f" },
      },
      fontFamily: {
        sans: ["var(--font-plex-sans)", "system-ui", "sans-serif"],
        mono: ["var(--font-plex-mono)", "ui-monospace", "monospace"],
      },
    },
  },
  plugins: [],
};
export default config;
