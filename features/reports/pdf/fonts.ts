import { join } from "node:path";
import { Font } from "@react-pdf/renderer";

let registered = false;

/**
 * Roboto from the installed @fontsource/roboto package (WOFF, Latin subset with €, £ and °):
 * shipped with the app, never fetched at run time.
 */
export function registerReportFonts() {
  if (registered) return;
  const dir = join(process.cwd(), "node_modules", "@fontsource", "roboto", "files");
  Font.register({
    family: "Roboto",
    fonts: [
      { src: join(dir, "roboto-latin-400-normal.woff"), fontWeight: 400 },
      { src: join(dir, "roboto-latin-400-italic.woff"), fontWeight: 400, fontStyle: "italic" },
      { src: join(dir, "roboto-latin-700-normal.woff"), fontWeight: 700 },
    ],
  });
  // Words are not split across lines: hyphenation rules for tyre sizes would read as errors.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
