import type { Config } from "tailwindcss";

/**
 * Treadcast's own palette. Neutral "ink" greys, a deep violet-indigo "furrow" for actions and
 * a "plum" accent; status colours are chosen for WCAG AA contrast on white and on their tints.
 * Contrast ratios are checked in tests/unit/ui/palette-contrast.test.ts.
 */
const config: Config = {
  content: [],
  theme: {
    extend: {
      colors: {
        ink: {
          50: "#f6f7f9",
          100: "#eceef2",
          200: "#d5d9e0",
          300: "#b0b7c3",
          500: "#667085",
          600: "#4d5566",
          700: "#3a4150",
          800: "#262b36",
          900: "#161a22",
        },
        furrow: {
          50: "#f0f0fb",
          100: "#e0e0f7",
          200: "#c3c2ee",
          500: "#5b55c9",
          600: "#4740b3",
          700: "#3a3494",
          800: "#2e2a75",
        },
        plum: { 50: "#fbf0f6", 600: "#8a2d6b", 700: "#6f2356" },
        ok: { 50: "#ecf7ef", 700: "#1d6b34" },
        caution: { 50: "#fdf5e6", 300: "#e8b85c", 800: "#7a4a00" },
        danger: { 50: "#fdeeee", 600: "#b42323", 700: "#951c1c" },
      },
      fontFamily: {
        sans: ["Roboto", "system-ui", "sans-serif"],
        mono: ["ui-monospace", "SFMono-Regular", "Menlo", "monospace"],
      },
      fontSize: {
        // A 1.2 ratio scale, large enough to read on a phone in a workshop.
        xs: ["0.75rem", { lineHeight: "1rem" }],
        sm: ["0.875rem", { lineHeight: "1.25rem" }],
        base: ["1rem", { lineHeight: "1.5rem" }],
        lg: ["1.2rem", { lineHeight: "1.75rem" }],
        xl: ["1.44rem", { lineHeight: "2rem" }],
        "2xl": ["1.728rem", { lineHeight: "2.25rem" }],
        "3xl": ["2.074rem", { lineHeight: "2.5rem" }],
      },
    },
  },
};

export default config;
