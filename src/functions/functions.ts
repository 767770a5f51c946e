/**
 * The worksheet functions as the spreadsheet sees them (namespace REDOX, set in manifest.xml). The metadata plugin
 * reads the JSDoc below to write functions.json; each declaration only delegates to its implementation module.
 * Every argument may be one cell or a range; ranges of the same shape (or single cells) broadcast and the result
 * spills. A blank cell is a missing value and gives a blank result; defaults apply to omitted arguments. Problems
 * give #VALUE! (wrong or out-of-range input) or #N/A (no answer) with a message naming the argument — the only two
 * codes whose message Excel shows.
 *
 * Structure: imports, declarations, then the association block at the end.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import { fromSHEAt, toSHEAt } from "./electrode-functions";
import { ehAt, neutralPHAt, peAt, slopeAt, waterLineAt, waterMarginAt } from "./water-functions";
import { ionicStrengthAt } from "./ionic-strength-functions";
import { boundaryFrom, coupleAt, dissolvedAt, regimeAt, speciesAt, speciesTable } from "./stability-functions";
import { dicAt } from "./carbonate-functions";
import { assessAt } from "./assess-functions";
import { electrodeList, metalList, versionTable } from "./list-functions";

/**
 * Potential of a water stability line, V vs SHE: the O2/H2O line (gas "O2", default) above which water is oxidised
 * to oxygen, or the H+/H2 line (gas "H2") below which it is reduced to hydrogen.
 * @customfunction WATERLINE
 * @param {any[][]} pH pH of the solution, −2 to 16.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (default 25): 1 atm below 100 °C, saturation pressure above.
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
 * @param {any[][]} potential Potential in V vs SHE, −3 to +3.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (default 25): 1 atm below 100 °C, saturation pressure above.
 * @param {any[][]} [overpotential] Extra width in V added beyond each line, 0 or more (default 0; about 0.6 V describes where water decomposes in practice).
 * @returns {any[][]} Margin in V.
 */
export function watermargin(pH: any[][], potential: any[][], temperature?: any[][], overpotential?: any[][]): any[][] {
  return waterMarginAt(pH, potential, temperature, overpotential);
}

/**
 * Converts a reading against a reference electrode to the standard hydrogen scale (V vs SHE).
 * @customfunction TOSHE
 * @param {any[][]} reading Measured potential against the reference electrode, in V (or mV with unit "mV").
 * @param {any[][]} electrode Reference electrode: SHE, SCE, AgCl-sat, AgCl-3.5M, AgCl-3M, AgCl-1M, AgCl-sea, CSE, MSE, HgO-1M or RHE (case-insensitive; common spellings accepted).
 * @param {any[][]} [temperature] Temperature of the reference electrode in °C (default 25).
 * @param {any[][]} [pH] pH of the solution, −2 to 16; needed only for RHE.
 * @param {any[][]} [unit] Unit of the reading: "V" (default) or "mV". The result is always in V vs SHE.
 * @returns {any[][]} Potential in V vs SHE.
 */
export function toshe(
  reading: any[][],
  electrode: any[][],
  temperature?: any[][],
  pH?: any[][],
  unit?: any[][],
): any[][] {
  return toSHEAt(reading, electrode, temperature, pH, unit);
}

/**
 * Converts a potential on the standard hydrogen scale to the reading against a reference electrode.
 * @customfunction FROMSHE
 * @param {any[][]} potential Potential in V vs SHE, −3 to +3.
 * @param {any[][]} electrode Reference electrode: SHE, SCE, AgCl-sat, AgCl-3.5M, AgCl-3M, AgCl-1M, AgCl-sea, CSE, MSE, HgO-1M or RHE (case-insensitive; common spellings accepted).
 * @param {any[][]} [temperature] Temperature of the reference electrode in °C (default 25).
 * @param {any[][]} [pH] pH of the solution, −2 to 16; needed only for RHE.
 * @param {any[][]} [unit] Unit of the result: "V" (default) or "mV".
 * @returns {any[][]} The reading against the electrode, in V or mV.
 */
export function fromshe(
  potential: any[][],
  electrode: any[][],
  temperature?: any[][],
  pH?: any[][],
  unit?: any[][],
): any[][] {
  return fromSHEAt(potential, electrode, temperature, pH, unit);
}

/**
 * Converts a potential (Eh, V vs SHE) to pe = F·Eh / (RT ln10).
 * @customfunction PE
 * @param {any[][]} potential Potential in V vs SHE.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (default 25): 1 atm below 100 °C, saturation pressure above.
 * @returns {any[][]} pe (dimensionless).
 */
export function pe(potential: any[][], temperature?: any[][]): any[][] {
  return peAt(potential, temperature);
}

/**
 * Converts pe to a potential (Eh, V vs SHE) = pe·RT ln10 / F.
 * @customfunction EH
 * @param {any[][]} pe pe (dimensionless).
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (default 25): 1 atm below 100 °C, saturation pressure above.
 * @returns {any[][]} Potential in V vs SHE.
 */
export function eh(pe: any[][], temperature?: any[][]): any[][] {
  return ehAt(pe, temperature);
}

/**
 * pH of pure water, ½ pKw, at the temperature (7.00 at 25 °C).
 * @customfunction NEUTRALPH
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (default 25): 1 atm below 100 °C, saturation pressure above.
 * @returns {any[][]} Neutral pH.
 */
export function neutralph(temperature?: any[][]): any[][] {
  return neutralPHAt(temperature);
}

/**
 * Nernst slope RT ln10 / F in V per decade (0.05916 V at 25 °C).
 * @customfunction SLOPE
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (default 25): 1 atm below 100 °C, saturation pressure above.
 * @returns {any[][]} Slope in V per decade.
 */
export function slope(temperature?: any[][]): any[][] {
  return slopeAt(temperature);
}

/**
 * Dominant (thermodynamically stable) form of a metal at a pH and potential, e.g. Fe2O3(s), Cu2+, Zn(s), and with ligands PbCO3(s), Cu2S(s). Thermodynamics only: what can form, not how fast.
 * @customfunction SPECIES
 * @param {any[][]} element Element symbol or name: Fe, Cu, Zn, Pb, Ni, Cr, Al, Mn, Sn, Co, Mg, Ti, Ag, Cd, Mo, V, W, Bi, Au, Pt, Hg, As, Sb, Se, U.
 * @param {any[][]} pH pH, from -2 to 16.
 * @param {any[][]} potential Potential in volts vs SHE, −3 to +3 (convert meter readings, also in mV, with REDOX.TOSHE).
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (1 atm below 100 °C, saturation pressure above). Default 25.
 * @param {any[][]} [activity] Activity of dissolved metal species, above 0 and at most 10. Default 1e-6.
 * @param {any[][]} [carbonate] Total dissolved inorganic carbon in mol/kg (REDOX.DIC gives it from alkalinity); blank = none. Carbonate, chloride, sulfur and phosphate are treated at fixed totals, exactly at the point: carbonate by its α-fractions at the pH, sulfur over sulfate, sulfide and elemental sulfur at the pH and potential, chloride free.
 * @param {any[][]} [chloride] Total chloride in mol/kg; blank = none.
 * @param {any[][]} [sulfur] Total dissolved sulfur (sulfate + sulfide) in mol/kg; blank = none. Sulfur is redox-active: sulfate in oxidising water, elemental sulfur or sulfide in reducing water.
 * @param {any[][]} [phosphate] Total orthophosphate in mol/kg as P (1 mg/L as PO4 = 1.05E-5); blank = none. Speciated exactly over H3PO4, H2PO4-, HPO4 2- and PO4 3- at the pH; forms lead, copper, zinc, iron and aluminium phosphates.
 * @param {any[][]} [ionicStrength] Ionic strength in mol/kg, 0 to 0.5 (REDOX.IONICSTRENGTH estimates it from conductivity or TDS); blank = ideal dilute solution. Activity coefficients of charged species by the Davies equation.
 * @returns {any[][]} Formula of the dominant species.
 */
export function species(
  element: any[][],
  pH: any[][],
  potential: any[][],
  temperature?: any[][],
  activity?: any[][],
  carbonate?: any[][],
  chloride?: any[][],
  sulfur?: any[][],
  phosphate?: any[][],
  ionicStrength?: any[][],
): any[][] {
  return speciesAt(
    element,
    pH,
    potential,
    temperature,
    activity,
    carbonate,
    chloride,
    sulfur,
    phosphate,
    ionicStrength,
  );
}

/**
 * Corrosion regime at a pH and potential: immunity (the metal is stable), passivation (a solid compound is stable) or corrosion (a dissolved species is stable).
 * @customfunction REGIME
 * @param {any[][]} element Metal symbol or name.
 * @param {any[][]} pH pH, from -2 to 16.
 * @param {any[][]} potential Potential in volts vs SHE.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (1 atm below 100 °C, saturation pressure above). Default 25.
 * @param {any[][]} [activity] Activity of dissolved metal species. Default 1e-6.
 * @param {any[][]} [carbonate] Total dissolved inorganic carbon in mol/kg (REDOX.DIC gives it from alkalinity); blank = none. Carbonate, chloride, sulfur and phosphate are treated at fixed totals, exactly at the point: carbonate by its α-fractions at the pH, sulfur over sulfate, sulfide and elemental sulfur at the pH and potential, chloride free.
 * @param {any[][]} [chloride] Total chloride in mol/kg; blank = none.
 * @param {any[][]} [sulfur] Total dissolved sulfur (sulfate + sulfide) in mol/kg; blank = none. Sulfur is redox-active: sulfate in oxidising water, elemental sulfur or sulfide in reducing water.
 * @param {any[][]} [phosphate] Total orthophosphate in mol/kg as P (1 mg/L as PO4 = 1.05E-5); blank = none. Speciated exactly over H3PO4, H2PO4-, HPO4 2- and PO4 3- at the pH; forms lead, copper, zinc, iron and aluminium phosphates.
 * @param {any[][]} [ionicStrength] Ionic strength in mol/kg, 0 to 0.5 (REDOX.IONICSTRENGTH estimates it from conductivity or TDS); blank = ideal dilute solution. Activity coefficients of charged species by the Davies equation.
 * @returns {any[][]} immunity, passivation or corrosion.
 */
export function regime(
  element: any[][],
  pH: any[][],
  potential: any[][],
  temperature?: any[][],
  activity?: any[][],
  carbonate?: any[][],
  chloride?: any[][],
  sulfur?: any[][],
  phosphate?: any[][],
  ionicStrength?: any[][],
): any[][] {
  return regimeAt(element, pH, potential, temperature, activity, carbonate, chloride, sulfur, phosphate, ionicStrength);
}

/**
 * Potential (V vs SHE) of the nearest stability boundary above or below the point at its pH; #N/A when none lies between -3 and +3 V.
 * @customfunction BOUNDARY
 * @param {any[][]} element Metal symbol or name.
 * @param {any[][]} pH pH, from -2 to 16.
 * @param {any[][]} potential Potential in volts vs SHE.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (1 atm below 100 °C, saturation pressure above). Default 25.
 * @param {any[][]} [activity] Activity of dissolved metal species. Default 1e-6.
 * @param {any[][]} [carbonate] Total dissolved inorganic carbon in mol/kg (REDOX.DIC gives it from alkalinity); blank = none. Carbonate, chloride, sulfur and phosphate are treated at fixed totals, exactly at the point: carbonate by its α-fractions at the pH, sulfur over sulfate, sulfide and elemental sulfur at the pH and potential, chloride free.
 * @param {any[][]} [chloride] Total chloride in mol/kg; blank = none.
 * @param {any[][]} [sulfur] Total dissolved sulfur (sulfate + sulfide) in mol/kg; blank = none. Sulfur is redox-active: sulfate in oxidising water, elemental sulfur or sulfide in reducing water.
 * @param {any[][]} [phosphate] Total orthophosphate in mol/kg as P (1 mg/L as PO4 = 1.05E-5); blank = none. Speciated exactly over H3PO4, H2PO4-, HPO4 2- and PO4 3- at the pH; forms lead, copper, zinc, iron and aluminium phosphates.
 * @param {any[][]} [ionicStrength] Ionic strength in mol/kg, 0 to 0.5 (REDOX.IONICSTRENGTH estimates it from conductivity or TDS); blank = ideal dilute solution. Activity coefficients of charged species by the Davies equation.
 * @param {any[][]} [direction] 1 for the boundary above (default), -1 for the one below.
 * @returns {any[][]} Potential of the boundary in volts vs SHE.
 */
export function boundary(
  element: any[][],
  pH: any[][],
  potential: any[][],
  temperature?: any[][],
  activity?: any[][],
  carbonate?: any[][],
  chloride?: any[][],
  sulfur?: any[][],
  phosphate?: any[][],
  ionicStrength?: any[][],
  direction?: any[][],
): any[][] {
  return boundaryFrom(
    element,
    pH,
    potential,
    temperature,
    activity,
    carbonate,
    chloride,
    sulfur,
    phosphate,
    ionicStrength,
    direction,
  );
}

/**
 * Equilibrium potential (V vs SHE) of the half-reaction between two species, balanced automatically with H2O, H+ and electrons; #N/A when both have the same oxidation state.
 * @customfunction COUPLE
 * @param {any[][]} oxidized Formula of the oxidized species, e.g. Fe3+ or Fe2O3(s).
 * @param {any[][]} reduced Formula of the reduced species, e.g. Fe2+ or Fe(s).
 * @param {any[][]} pH pH, from -2 to 16.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (1 atm below 100 °C, saturation pressure above). Default 25.
 * @param {any[][]} [activity] Activity of the dissolved species. Default 1e-6.
 * @returns {any[][]} Equilibrium potential in volts vs SHE.
 */
export function couple(
  oxidized: any[][],
  reduced: any[][],
  pH: any[][],
  temperature?: any[][],
  activity?: any[][],
): any[][] {
  return coupleAt(oxidized, reduced, pH, temperature, activity);
}

/**
 * Total dissolved metal (free ion, hydroxo, carbonato and chloro complexes), lead and copper phosphates included, in equilibrium with the controlling solid: the solid, the metal included, that is most stable at the point. A number wherever a solid can form; #N/A where even the most stable solid would dissolve (more than 1 mol/kg). Does not depend on a threshold activity. A thermodynamic estimate, not a substitute for laboratory analysis of lead or copper in drinking water.
 * @customfunction DISSOLVED
 * @param {any[][]} element Metal symbol or name.
 * @param {any[][]} pH pH, from -2 to 16.
 * @param {any[][]} potential Potential in volts vs SHE.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (1 atm below 100 °C, saturation pressure above). Default 25.
 * @param {any[][]} [carbonate] Total dissolved inorganic carbon in mol/kg (REDOX.DIC gives it from alkalinity); blank = none. Carbonate, chloride, sulfur and phosphate are treated at fixed totals, exactly at the point: carbonate by its α-fractions at the pH, sulfur over sulfate, sulfide and elemental sulfur at the pH and potential, chloride free.
 * @param {any[][]} [chloride] Total chloride in mol/kg; blank = none.
 * @param {any[][]} [sulfur] Total dissolved sulfur (sulfate + sulfide) in mol/kg; blank = none. Sulfur is redox-active: sulfate in oxidising water, elemental sulfur or sulfide in reducing water.
 * @param {any[][]} [phosphate] Total orthophosphate in mol/kg as P (1 mg/L as PO4 = 1.05E-5); blank = none. Speciated exactly over H3PO4, H2PO4-, HPO4 2- and PO4 3- at the pH; forms lead, copper, zinc, iron and aluminium phosphates.
 * @param {any[][]} [ionicStrength] Ionic strength in mol/kg, 0 to 0.5 (REDOX.IONICSTRENGTH estimates it from conductivity or TDS); blank = ideal dilute solution. Activity coefficients of charged species by the Davies equation.
 * @param {any[][]} [unit] mol/kg (default), mg/L or ug/L.
 * @returns {any[][]} Dissolved metal in the chosen unit.
 */
export function dissolved(
  element: any[][],
  pH: any[][],
  potential: any[][],
  temperature?: any[][],
  carbonate?: any[][],
  chloride?: any[][],
  sulfur?: any[][],
  phosphate?: any[][],
  ionicStrength?: any[][],
  unit?: any[][],
): any[][] {
  return dissolvedAt(element, pH, potential, temperature, carbonate, chloride, sulfur, phosphate, ionicStrength, unit);
}

/**
 * Ionic strength in mol/kg estimated from specific conductance (I ≈ 1.6E-5 × µS/cm, Russell 1976) or total dissolved solids (I ≈ 2.5E-5 × mg/L, Langelier 1936), for the ionicStrength argument. Empirical, about ±30 % in fresh waters.
 * @customfunction IONICSTRENGTH
 * @param {any[][]} value Specific conductance in µS/cm at 25 °C, or TDS in mg/L.
 * @param {any[][]} basis "uS/cm" (conductance) or "mg/L" (TDS).
 * @returns {any[][]} Ionic strength in mol/kg.
 */
export function ionicstrength(value: any[][], basis: any[][]): any[][] {
  return ionicStrengthAt(value, basis);
}

/**
 * Table of a metal's species with a header row: formula, state, name, Gibbs energy of formation at the temperature (kJ/mol) and data source.
 * @customfunction SPECIESTABLE
 * @param {any[][]} element Metal symbol or name.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (1 atm below 100 °C, saturation pressure above). Default 25.
 * @returns {any[][]} The table; it spills.
 */
export function speciestable(element: any[][], temperature?: any[][]): any[][] {
  return speciesTable(element, temperature);
}

/**
 * Total dissolved inorganic carbon (mol/kg) from total alkalinity and pH, for the carbonate argument of SPECIES, REGIME, BOUNDARY and DISSOLVED. Carbonic acid constants and their temperature dependence from Plummer & Busenberg (1982); ideal dilute water (activity coefficients 1, mg/L taken per kg); other bases (borate, silicate, phosphate, organics) counted as carbonate. #N/A below the alkalinity end point (pH 4.5), where alkalinity does not determine DIC.
 * @customfunction DIC
 * @param {any[][]} alkalinity Total alkalinity in mg/L as CaCO3, 0 or more.
 * @param {any[][]} pH pH, from -2 to 16.
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (1 atm below 100 °C, saturation pressure above). Default 25.
 * @returns {any[][]} Dissolved inorganic carbon in mol/kg.
 */
export function dic(alkalinity: any[][], pH: any[][], temperature?: any[][]): any[][] {
  return dicAt(alkalinity, pH, temperature);
}

/**
 * One row per sample: dominant species, regime, nearest boundary above and below (V vs SHE), water margin (V), equilibrium dissolved metal and the solid controlling it — what SPECIES, REGIME, BOUNDARY, WATERMARGIN and DISSOLVED give for that row. Give single cells or columns; the answer spills. Thermodynamics only: what can form, not how fast.
 * @customfunction ASSESS
 * @param {any[][]} element Metal symbol or name (REDOX.METALS lists them).
 * @param {any[][]} pH pH, from -2 to 16.
 * @param {any[][]} potential Potential in volts vs SHE, −3 to +3 (convert meter readings with REDOX.TOSHE).
 * @param {any[][]} [temperature] Temperature in °C, 0 to 300 (1 atm below 100 °C, saturation pressure above). Default 25; a blank cell is a missing measurement.
 * @param {any[][]} [activity] Activity of dissolved metal species deciding the dominant species. Default 1e-6.
 * @param {any[][]} [carbonate] Total dissolved inorganic carbon in mol/kg (REDOX.DIC gives it from alkalinity); blank = none.
 * @param {any[][]} [chloride] Total chloride in mol/kg; blank = none.
 * @param {any[][]} [sulfur] Total dissolved sulfur (sulfate + sulfide) in mol/kg; blank = none.
 * @param {any[][]} [phosphate] Total orthophosphate in mol/kg as P (1 mg/L as PO4 = 1.05E-5); blank = none.
 * @param {any[][]} [ionicStrength] Ionic strength in mol/kg, 0 to 0.5 (REDOX.IONICSTRENGTH estimates it); blank = ideal dilute solution.
 * @param {any[][]} [unit] Unit of the dissolved metal: mol/kg (default), mg/L or ug/L.
 * @param {any[][]} [header] TRUE for a header row above the answers.
 * @returns {any[][]} Seven columns per sample row.
 */
export function assess(
  element: any[][],
  pH: any[][],
  potential: any[][],
  temperature?: any[][],
  activity?: any[][],
  carbonate?: any[][],
  chloride?: any[][],
  sulfur?: any[][],
  phosphate?: any[][],
  ionicStrength?: any[][],
  unit?: any[][],
  header?: any[][],
): any[][] {
  return assessAt(
    element,
    pH,
    potential,
    temperature,
    activity,
    carbonate,
    chloride,
    sulfur,
    phosphate,
    ionicStrength,
    unit,
    header,
  );
}

/**
 * The supported metals by symbol, one per row (for a Data Validation list).
 * @customfunction METALS
 * @returns {any[][]} Metal symbols; the list spills down.
 */
export function metals(): any[][] {
  return metalList();
}

/**
 * The reference electrode names the conversions accept, one per row (for a Data Validation list).
 * @customfunction ELECTRODES
 * @returns {any[][]} Electrode names; the list spills down.
 */
export function electrodes(): any[][] {
  return electrodeList();
}

/**
 * The add-in version and a fingerprint of the thermodynamic and electrode data it answers from, for audit trails.
 * @customfunction VERSION
 * @returns {any[][]} Two rows: add-in and data.
 */
export function version(): any[][] {
  return versionTable();
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
  CustomFunctions.associate("SPECIES", species);
  CustomFunctions.associate("REGIME", regime);
  CustomFunctions.associate("BOUNDARY", boundary);
  CustomFunctions.associate("COUPLE", couple);
  CustomFunctions.associate("DISSOLVED", dissolved);
  CustomFunctions.associate("IONICSTRENGTH", ionicstrength);
  CustomFunctions.associate("SPECIESTABLE", speciestable);
  CustomFunctions.associate("DIC", dic);
  CustomFunctions.associate("ASSESS", assess);
  CustomFunctions.associate("METALS", metals);
  CustomFunctions.associate("ELECTRODES", electrodes);
  CustomFunctions.associate("VERSION", version);
}
