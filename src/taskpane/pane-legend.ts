/**
 * The legend under the diagram, as HTML: each regime's region swatch and sample marker, the water window band and
 * its dashed lines, the kinetic band when shown, the thin white lines where a ligand's dominant form changes (named
 * by the two forms they separate), and the site colours when samples are coloured by site.
 */
import { REGIMES, type Regime } from "../chemistry";
import { escapeXml, MARKER_FILLS, markerSvg, regionFill, WATER_BAND, WATER_LINE } from "../diagram";

/** Site colours: the Okabe–Ito set (Okabe & Ito 2008, Color Universal Design), distinct under colour-vision deficiencies. */
export const SITE_COLOURS = [
  "#E69F00",
  "#56B4E9",
  "#009E73",
  "#F0E442",
  "#0072B2",
  "#D55E00",
  "#CC79A7",
  "#000000",
] as const;

export interface LegendOptions {
  readonly kinetic: boolean;
  /** Ligand form changes crossing the diagram, as "HCO3− | CO3²−". */
  readonly ligandEdges: readonly string[];
  /** Site → colour, when samples are coloured by site. */
  readonly sites?: ReadonlyMap<string, string>;
}

const REGIME_TEXT: Record<Regime, string> = {
  immunity: "immunity: the metal is stable",
  passivation: "passivation: a solid film is stable",
  corrosion: "corrosion: dissolved forms are stable",
};

const item = (symbol: string, text: string, cls = "") =>
  `<li${cls ? ` class="${cls}"` : ""}>${symbol}<span>${escapeXml(text)}</span></li>`;
const swatch = (style: string) => `<span class="swatch" style="${style}" aria-hidden="true"></span>`;

export function legendHtml(o: LegendOptions): string {
  const parts: string[] = [];
  for (const regime of REGIMES) {
    parts.push(
      item(swatch(`background:${regionFill(regime, 0)}`) + markerSvg(regime), REGIME_TEXT[regime], `legend-${regime}`),
    );
  }
  parts.push(
    item(
      swatch(
        `background:${WATER_BAND}40;border:none;border-top:2px dashed ${WATER_LINE};border-bottom:2px dashed ${WATER_LINE}`,
      ),
      "water stable between the dashed O₂/H₂O (upper) and H⁺/H₂ (lower) lines",
      "legend-water",
    ),
  );
  if (o.kinetic)
    parts.push(
      item(
        swatch(`background:${WATER_BAND}18;border:1px dotted ${WATER_LINE}`),
        "kinetic band: in practice water decomposes only about 0.6 V beyond its lines",
        "legend-kinetic",
      ),
    );
  if (o.ligandEdges.length > 0) {
    parts.push(
      item(
        swatch("background:#cfd6de;border:none;border-left:2px solid #fff;border-right:2px solid #fff"),
        `thin white lines: the water's dominant ligand form changes (${o.ligandEdges.join("; ")})`,
        "legend-ligand",
      ),
    );
  }
  if (o.sites) {
    for (const [site, colour] of o.sites)
      parts.push(item(swatch(`background:${colour};border-radius:50%`), site, "legend-site"));
  }
  return parts.join("");
}

export { MARKER_FILLS };
