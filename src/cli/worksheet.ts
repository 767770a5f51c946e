/**
 * The worksheet functions the command line evaluates, imported from the same sources the spreadsheet bundle is
 * built from, so a CSV row and a worksheet row give the same answers. Each takes cells or columns (n × 1 ranges)
 * and returns a range of results, with CellError values where the spreadsheet would show an error. The metal columns
 * come from ASSESS, whose answers are those of SPECIES, REGIME, BOUNDARY and DISSOLVED.
 */
import { assessColumns, dicAt, ionicStrengthAt, toSHEAt, waterMarginAt } from "../functions";

/** The functions by their own signatures (one argument order, written once in src/functions). */
export interface WorksheetFunctions {
  /** REDOX.TOSHE(reading, electrode, [temperature], [pH], [unit]) */
  toShe: typeof toSHEAt;
  /** REDOX.WATERMARGIN(pH, potential, [temperature], [overpotential]) */
  waterMargin: typeof waterMarginAt;
  /**
   * REDOX.ASSESS(element, pH, potential, [temperature], [activity], [carbonate], [chloride], [sulfur], [phosphate],
   * [ionicStrength], [unit]) for a batch of n rows, as columns: the species (REDOX.SPECIES), regime (REDOX.REGIME),
   * boundaries above and below (REDOX.BOUNDARY) and dissolved metal (REDOX.DISSOLVED) of each row, worked out in one
   * pass per row.
   */
  assess: typeof assessColumns;
  /** REDOX.DIC(alkalinity, pH, [temperature]) */
  dic: typeof dicAt;
  /** REDOX.IONICSTRENGTH(value, basis) */
  ionicStrength: typeof ionicStrengthAt;
}

export const worksheetFunctions: WorksheetFunctions = {
  toShe: toSHEAt,
  waterMargin: waterMarginAt,
  assess: assessColumns,
  dic: dicAt,
  ionicStrength: ionicStrengthAt,
};
