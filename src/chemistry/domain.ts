/**
 * The domain every layer shares (docs/method.md, Domain): the pH and temperature ranges accepted, the defaults of
 * omitted arguments, and the regime names. Functions, diagram, pane and command line read them from here.
 */
import type { Regime } from "./system";

export { MAX_CELSIUS, MIN_CELSIUS } from "./constants";

/** pH accepted by the worksheet functions and drawn on the full diagram (docs/method.md, Domain). */
export const PH_MIN = -2;
export const PH_MAX = 16;
/** Largest potential magnitude accepted, V vs SHE: beyond ±3 V no aqueous redox couple exists (common practice). */
export const MAX_POTENTIAL = 3;
/** Potential span of the full diagram, V vs SHE (common practice: water's stability field lies well inside). */
export const FULL_E_LIMIT = 2;
/** Potentials searched for boundaries, V vs SHE (docs/method.md, Domain: #N/A when none in −3…+3 V). */
export const BOUNDARY_SEARCH_LOW = -MAX_POTENTIAL;
export const BOUNDARY_SEARCH_HIGH = MAX_POTENTIAL;
/** Activity of dissolved metal species when none is given (10⁻⁶, the usual corrosion threshold: common practice). */
export const DEFAULT_ACTIVITY = 1e-6;
/** Highest activity accepted for dissolved metal species. */
export const MAX_ACTIVITY = 10;
/** Temperature when none is given, °C (the standard reference temperature, 298.15 K). */
export const DEFAULT_CELSIUS = 25;
/** A bound as messages and help text write it, with the minus sign U+2212: −2. */
export const boundText = (x: number): string => String(x).replace("-", "\u2212");
/** The corrosion regimes in their usual order: the metal stable, a solid compound stable, a dissolved species stable. */
export const REGIMES: readonly Regime[] = ["immunity", "passivation", "corrosion"];
