/**
 * The worksheet functions as the spreadsheet sees them (namespace REDOX, set in manifest.xml). The metadata plugin
 * reads the JSDoc below to write functions.json; each declaration only delegates to its implementation module.
 * Every argument may be one cell or a range; ranges of the same shape (or single cells) broadcast and the result
 * spills. Blank input gives a blank result; problems give #VALUE!, #NUM! or #N/A with a message naming the argument.
 *
 * Structure: imports, declarations, then the association block at the end.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import { fromSHEAt, toSHEAt } from "./electrode-functions";
import { ehAt, neutralPHAt, peAt, slopeAt, waterLineAt, waterMarginAt } from "./water-functions";

/**
 * Potential of a water stability line, V vs SHE: the O2/H2O line (gas "O2", default) above which water is oxidised
 * to oxygen, or the H+/H2 line (gas "H2") below which it is reduced to hydrogen.
 * @customfunction WATERLINE
 * @param {any[][]} pH pH of the solution, −2 to 16.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 100 (default 25).
 * @param {any[][]} [gas] "O2" for the oxygen line (default) or "H2" for the hydrogen line.
 * @param {any[][]} [pressure] Partial pressure of the gas in bar, above 0 (default 1).
 * @returns {any[][]} Potential in V vs SHE.
 */
export function waterline(pH: any[][], temperature?: any[][], gas?: any[][], pressure?: any[][]): any[][] {
  return waterLineAt(pH, temperature, gas, pressure);
}

/**
 * Signed distance in V of a potential from the water stability window (both gases at 1 bar): positive inside the
 * window (distance to the nearer line), negative outside (how far beyond the line crossed).
 * @customfunction WATERMARGIN
 * @param {any[][]} pH pH of the solution, −2 to 16.
 * @param {any[][]} potential Potential in V vs SHE.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 100 (default 25).
 * @param {any[][]} [overpotential] Extra width in V added beyond each line, 0 or more (default 0; about 0.6 V describes where water decomposes in practice).
 * @returns {any[][]} Margin in V.
 */
export function watermargin(pH: any[][], potential: any[][], temperature?: any[][], overpotential?: any[][]): any[][] {
  return waterMarginAt(pH, potential, temperature, overpotential);
}

/**
 * Converts a reading against a reference electrode to the standard hydrogen scale (V vs SHE).
 * @customfunction TOSHE
 * @param {any[][]} reading Measured potential in V against the reference electrode.
 * @param {any[][]} electrode Reference electrode: SHE, SCE, AgCl-sat, AgCl-3.5M, AgCl-3M, AgCl-1M, AgCl-sea, CSE, MSE, HgO-1M or RHE (case-insensitive; common spellings accepted).
 * @param {any[][]} [temperature] Temperature of the reference electrode in °C (default 25).
 * @param {any[][]} [pH] pH of the solution, −2 to 16; needed only for RHE.
 * @returns {any[][]} Potential in V vs SHE.
 */
export function toshe(reading: any[][], electrode: any[][], temperature?: any[][], pH?: any[][]): any[][] {
  return toSHEAt(reading, electrode, temperature, pH);
}

/**
 * Converts a potential on the standard hydrogen scale to the reading against a reference electrode.
 * @customfunction FROMSHE
 * @param {any[][]} potential Potential in V vs SHE.
 * @param {any[][]} electrode Reference electrode: SHE, SCE, AgCl-sat, AgCl-3.5M, AgCl-3M, AgCl-1M, AgCl-sea, CSE, MSE, HgO-1M or RHE (case-insensitive; common spellings accepted).
 * @param {any[][]} [temperature] Temperature of the reference electrode in °C (default 25).
 * @param {any[][]} [pH] pH of the solution, −2 to 16; needed only for RHE.
 * @returns {any[][]} Potential in V against the electrode.
 */
export function fromshe(potential: any[][], electrode: any[][], temperature?: any[][], pH?: any[][]): any[][] {
  return fromSHEAt(potential, electrode, temperature, pH);
}

/**
 * Converts a potential (Eh, V vs SHE) to pe = F·Eh / (RT ln10).
 * @customfunction PE
 * @param {any[][]} potential Potential in V vs SHE.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 100 (default 25).
 * @returns {any[][]} pe (dimensionless).
 */
export function pe(potential: any[][], temperature?: any[][]): any[][] {
  return peAt(potential, temperature);
}

/**
 * Converts pe to a potential (Eh, V vs SHE) = pe·RT ln10 / F.
 * @customfunction EH
 * @param {any[][]} pe pe (dimensionless).
 * @param {any[][]} [temperature] Temperature in °C, 0 to 100 (default 25).
 * @returns {any[][]} Potential in V vs SHE.
 */
export function eh(pe: any[][], temperature?: any[][]): any[][] {
  return ehAt(pe, temperature);
}

/**
 * pH of pure water, ½ pKw, at the temperature (7.00 at 25 °C).
 * @customfunction NEUTRALPH
 * @param {any[][]} [temperature] Temperature in °C, 0 to 100 (default 25).
 * @returns {any[][]} Neutral pH.
 */
export function neutralph(temperature?: any[][]): any[][] {
  return neutralPHAt(temperature);
}

/**
 * Nernst slope RT ln10 / F in V per decade (0.05916 V at 25 °C).
 * @customfunction SLOPE
 * @param {any[][]} [temperature] Temperature in °C, 0 to 100 (default 25).
 * @returns {any[][]} Slope in V per decade.
 */
export function slope(temperature?: any[][]): any[][] {
  return slopeAt(temperature);
}

if (typeof CustomFunctions !== "undefined") {
  CustomFunctions.associate("WATERLINE", waterline);
  CustomFunctions.associate("WATERMARGIN", watermargin);
  CustomFunctions.associate("TOSHE", toshe);
  CustomFunctions.associate("FROMSHE", fromshe);
  CustomFunctions.associate("PE", pe);
  CustomFunctions.associate("EH", eh);
  CustomFunctions.associate("NEUTRALPH", neutralph);
  CustomFunctions.associate("SLOPE", slope);
}
