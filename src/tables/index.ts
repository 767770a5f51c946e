/**
 * src/tables: reading sample logs, for the task pane and the command line alike. Host-free (no Office, no DOM,
 * no Node). Its public surface:
 * - header-match.ts  which column is pH, potential, temperature, metal, id, site, dissolved metal, alkalinity,
 *                    chloride, sulfate, DIC — and the unit, electrode and temperature scale their headers name
 * - delimiter.ts     the field separator of a table from its header line
 * - numbers.ts       numbers with a decimal point or a decimal comma, and which of the two a table uses
 * - ionic-columns.ts  conductivity, TDS and ionic-strength columns, their units, and I in mol/kg
 * - units.ts         one table per kind of unit: temperature scales, potential units, water units
 * - delimited-text.ts  pasted or opened text → rows of cells (the pane; the command line streams its own)
 */
export {
  BARE_SILVER_CHLORIDE,
  COLUMN_ROLES,
  EMPTY_MAPPING,
  electrodeHint,
  electrodeNamed,
  findHeaderRow,
  headerTokens,
  matchHeaders,
  matchWaterColumns,
  temperatureScale,
  waterColumnAt,
  WATER_COLUMN_ROLES,
  type ColumnMapping,
  type ColumnRole,
  type HeaderHints,
  type HeaderMatch,
  type WaterColumn,
  type WaterColumnRole,
  type WaterColumns,
} from "./header-match";
export {
  headerIsIonic,
  IONIC_COLUMN_ROLES,
  IONIC_UNITS,
  ionicStrengthOf,
  ionicUnit,
  isNumericColumn,
  matchIonicColumns,
  type IonicColumn,
  type IonicColumnRole,
  type IonicUnit,
} from "./ionic-columns";
export { DELIMITERS, guessDelimiter } from "./delimiter";
export {
  COMMA_NUMBER,
  guessDecimalMark,
  POINT_NUMBER,
  readNumber,
  withDecimalCommas,
  writeDecimal,
  type DecimalMark,
} from "./numbers";
export {
  alkalinityFactor,
  dicBasis,
  isAlkalinityUnit,
  molalFactor,
  POTENTIAL_UNITS,
  TEMPERATURE_SCALES,
  toCelsius,
  WATER_UNIT_WORDS,
  WATER_UNITS,
  type FormulaParts,
  type PotentialUnit,
  type TemperatureScale,
  type WaterUnit,
} from "./units";
export { parseDelimited, type ParsedText } from "./delimited-text";
