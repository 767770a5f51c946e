/**
 * Every worksheet function of the REDOX namespace, declared for the spreadsheet. The custom-functions metadata
 * plugin reads the JSDoc here to write functions.json; each declaration delegates in one line to its
 * implementation module. Several contributors add to this file: append your declarations and their association
 * lines; do not replace the file.
 *
 * Every argument accepts one cell or a range; ranges of the same shape (or single cells) broadcast and the result
 * spills. A blank input cell gives a blank result. Defaults: temperature 25 °C, activity 1e-6, potentials in volts
 * vs SHE.
 */
import { boundaryFrom, coupleAt, dissolvedAt, regimeAt, speciesAt, speciesTable } from "./stability-functions";

/**
 * Dominant (thermodynamically stable) form of a metal at a pH and potential, e.g. Fe2O3(s), Cu2+, Zn(s).
 * @customfunction SPECIES
 * @param {any[][]} element Metal symbol or name: Fe, Cu, Zn, Pb, Ni, Cr, Al, Mn, Sn, Co, Mg, Ti, Ag, Cd, Mo.
 * @param {any[][]} pH pH, from -2 to 16.
 * @param {any[][]} potential Potential in volts vs SHE (convert meter readings with REDOX.TOSHE).
 * @param {any[][]} [temperature] Temperature in °C, 0 to 100. Default 25.
 * @param {any[][]} [activity] Activity of dissolved metal species, above 0 and at most 10. Default 1e-6.
 * @returns {any[][]} Formula of the dominant species.
 */
export function species(element: any[][], pH: any[][], potential: any[][], temperature?: any[][], activity?: any[][]): any[][] {
  return speciesAt(element, pH, potential, temperature, activity);
}

/**
 * Corrosion regime at a pH and potential: immunity (the metal is stable), passivation (a solid compound is stable) or corrosion (a dissolved species is stable).
 * @customfunction REGIME
 * @param {any[][]} element Metal symbol or name.
 * @param {any[][]} pH pH, from -2 to 16.
 * @param {any[][]} potential Potential in volts vs SHE.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 100. Default 25.
 * @param {any[][]} [activity] Activity of dissolved metal species. Default 1e-6.
 * @returns {any[][]} immunity, passivation or corrosion.
 */
export function regime(element: any[][], pH: any[][], potential: any[][], temperature?: any[][], activity?: any[][]): any[][] {
  return regimeAt(element, pH, potential, temperature, activity);
}

/**
 * Potential (V vs SHE) of the nearest stability boundary above or below the point at its pH; #N/A when none lies between -3 and +3 V.
 * @customfunction BOUNDARY
 * @param {any[][]} element Metal symbol or name.
 * @param {any[][]} pH pH, from -2 to 16.
 * @param {any[][]} potential Potential in volts vs SHE.
 * @param {any[][]} [direction] 1 for the boundary above (default), -1 for the one below.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 100. Default 25.
 * @param {any[][]} [activity] Activity of dissolved metal species. Default 1e-6.
 * @returns {any[][]} Potential of the boundary in volts vs SHE.
 */
export function boundary(element: any[][], pH: any[][], potential: any[][], direction?: any[][], temperature?: any[][], activity?: any[][]): any[][] {
  return boundaryFrom(element, pH, potential, direction, temperature, activity);
}

/**
 * Equilibrium potential (V vs SHE) of the half-reaction between two species, balanced automatically with H2O, H+ and electrons; #N/A when both have the same oxidation state.
 * @customfunction COUPLE
 * @param {any[][]} oxidized Formula of the oxidized species, e.g. Fe3+ or Fe2O3(s).
 * @param {any[][]} reduced Formula of the reduced species, e.g. Fe2+ or Fe(s).
 * @param {any[][]} pH pH, from -2 to 16.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 100. Default 25.
 * @param {any[][]} [activity] Activity of the dissolved species. Default 1e-6.
 * @returns {any[][]} Equilibrium potential in volts vs SHE.
 */
export function couple(oxidized: any[][], reduced: any[][], pH: any[][], temperature?: any[][], activity?: any[][]): any[][] {
  return coupleAt(oxidized, reduced, pH, temperature, activity);
}

/**
 * Total dissolved metal in equilibrium with the solid that is stable at the point (ideal dilute solution); #N/A where a dissolved species is dominant.
 * @customfunction DISSOLVED
 * @param {any[][]} element Metal symbol or name.
 * @param {any[][]} pH pH, from -2 to 16.
 * @param {any[][]} potential Potential in volts vs SHE.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 100. Default 25.
 * @param {any[][]} [unit] mol/kg (default), mg/L or ug/L.
 * @param {any[][]} [activity] Activity threshold deciding which species is dominant. Default 1e-6.
 * @returns {any[][]} Dissolved metal in the chosen unit.
 */
export function dissolved(element: any[][], pH: any[][], potential: any[][], temperature?: any[][], unit?: any[][], activity?: any[][]): any[][] {
  return dissolvedAt(element, pH, potential, temperature, unit, activity);
}

/**
 * Table of a metal's species with a header row: formula, state, name, Gibbs energy of formation at the temperature (kJ/mol) and data source.
 * @customfunction SPECIESTABLE
 * @param {any[][]} element Metal symbol or name.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 100. Default 25.
 * @returns {any[][]} The table; it spills.
 */
export function speciestable(element: any[][], temperature?: any[][]): any[][] {
  return speciesTable(element, temperature);
}

if (typeof CustomFunctions !== "undefined") {
  CustomFunctions.associate("SPECIES", species);
  CustomFunctions.associate("REGIME", regime);
  CustomFunctions.associate("BOUNDARY", boundary);
  CustomFunctions.associate("COUPLE", couple);
  CustomFunctions.associate("DISSOLVED", dissolved);
  CustomFunctions.associate("SPECIESTABLE", speciestable);
}
