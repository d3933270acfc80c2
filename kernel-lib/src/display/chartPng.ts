/**
 * PNG export of a chart for reports: the static SVG (renderSvg) rasterised by @resvg/resvg-js.
 * resvg draws text only with fonts it can load; with no font found it would draw charts with blank
 * labels, so that case is refused with a message that says how to fix it.
 */
import { withTheme } from "../charts/theme.js";
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { InputError } from "../errors.js";
import { renderSvg } from "./renderSvg.js";
import type { VegaLiteSpec } from "./vegaLiteSpec.js";

/** Options of {@link chartPng} and {@link savePng}. */
export interface ChartPngOptions {
  /** Pixels per CSS pixel of the chart (2 gives print quality). Default 2. Range (0, 10]. */
  scale?: number;
  /** Background colour (CSS colour). Default "white"; use "transparent" for none. */
  background?: string;
  /** Extra font files (.ttf/.otf) to load, e.g. when the machine has no system fonts. */
  fontFiles?: string[];
}

/** Font folders searched, per platform, to tell "no fonts at all" apart from a working setup. */
function systemFontDirs(): string[] {
  const home = os.homedir();
  return [
    "/usr/share/fonts",
    "/usr/local/share/fonts",
    path.join(home, ".fonts"),
    path.join(home, ".local/share/fonts"),
    "/System/Library/Fonts",
    "/Library/Fonts",
    path.join(home, "Library/Fonts"),
    path.join(process.env.WINDIR ?? "C:\\Windows", "Fonts"),
  ];
}

function hasFontFile(dir: string, depth = 0): boolean {
  let entries: fs.Dirent[];
  try {
    entries = fs.readdirSync(dir, { withFileTypes: true });
  } catch {
    return false;
  }
  for (const entry of entries) {
    if (entry.isFile() && /\.(ttf|otf|ttc)$/i.test(entry.name)) return true;
    if (entry.isDirectory() && depth < 4 && hasFontFile(path.join(dir, entry.name), depth + 1)) {
      return true;
    }
  }
  return false;
}

let systemFontsFound: boolean | undefined;

/** True when at least one font file exists in the usual system font folders (cached). */
export function systemFontsAvailable(): boolean {
  systemFontsFound ??= systemFontDirs().some((dir) => hasFontFile(dir));
  return systemFontsFound;
}

/**
 * Renders a chart as PNG bytes.
 * @param spec A Vega-Lite v6 specification with inline data.
 * @param options See {@link ChartPngOptions}.
 * @returns The PNG file content.
 * @throws InputError for a bad scale; Error when no font can be found (text would be blank).
 * @example
 * const png = await chartPng(spec, { scale: 2 });
 */
export async function chartPng(
  spec: VegaLiteSpec,
  options: ChartPngOptions = {},
): Promise<Uint8Array> {
  const scale = options.scale ?? 2;
  if (!(scale > 0 && scale <= 10)) {
    throw new InputError({
      input: "options.scale",
      unit: "-",
      validRange: "> 0 and <= 10",
      received: scale,
    });
  }
  const fontFiles = options.fontFiles ?? [];
  for (const file of fontFiles) {
    if (!fs.existsSync(file)) {
      throw new InputError({
        input: "options.fontFiles",
        unit: "-",
        validRange: "paths of existing font files",
        received: file,
      });
    }
  }
  if (fontFiles.length === 0 && !systemFontsAvailable()) {
    throw new Error(
      "chartPng: no fonts found on this machine (searched " +
        systemFontDirs().join(", ") +
        "), so chart text would be blank. Install a font package (e.g. Debian fonts-dejavu-core) " +
        "or pass options.fontFiles.",
    );
  }
  const svg = await renderSvg(withTheme(spec));
  const { Resvg } = await import("@resvg/resvg-js");
  const resvg = new Resvg(svg, {
    fitTo: { mode: "zoom", value: scale },
    background: options.background ?? "white",
    font: {
      loadSystemFonts: true,
      fontFiles,
      defaultFontFamily: "DejaVu Sans",
      sansSerifFamily: "DejaVu Sans",
    },
  });
  return new Uint8Array(resvg.render().asPng());
}

/**
 * Writes a chart as a PNG file (folders are created as needed).
 * @returns The absolute path written and the image size in pixels.
 */
export async function savePng(
  spec: VegaLiteSpec,
  filePath: string,
  options: ChartPngOptions = {},
): Promise<{ path: string; widthPx: number; heightPx: number }> {
  if (typeof filePath !== "string" || filePath.length === 0) {
    throw new InputError({
      input: "filePath",
      unit: "-",
      validRange: "a non-empty path",
      received: filePath,
    });
  }
  const png = await chartPng(spec, options);
  const absolute = path.resolve(filePath);
  fs.mkdirSync(path.dirname(absolute), { recursive: true });
  fs.writeFileSync(absolute, png);
  const view = new DataView(png.buffer, png.byteOffset, png.byteLength);
  return { path: absolute, widthPx: view.getUint32(16), heightPx: view.getUint32(20) };
}
