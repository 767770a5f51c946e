/**
 * The diagram layer: host-free (no Office, no DOM) model and renderer of potential–pH diagrams, used by the task
 * pane and the command line. It depends on src/chemistry only.
 *
 * - diagram-model: display scales (electrode, unit), the shown window, regions, water lines, samples to plot
 * - diagram-svg: the whole diagram as SVG text
 * - axes: window → pixel transforms and ticks
 * - label-placement: where a region's label fits
 * - markers: the sample marker (shape and fill by regime) for SVG and canvas
 * - palette: colours by regime, contrast checks
 * - formula-markup: chemical formulas as sub- and superscript segments
 * - water-words: ligand totals in words
 * - solubility-curve, solubility-chart-svg, solubility-words: dissolved metal along pH at a sample's potential
 *   (model from an evaluator the host answers with REDOX.DISSOLVED, SVG, words)
 */
export { AxisError, formatTick, makeAxes, niceTicks } from "./axes";
export type { Axes, AxisWindow, PlotArea } from "./axes";
export { defaultWindow, displayScale, plotSamples, scaleProblem, shownRegions, shownWaterLines } from "./diagram-model";
export type { DisplayScale, PlottedSample, PotentialUnit, SampleInput, ShownLine, ShownRegion } from "./diagram-model";
export {
  diagramLayout,
  escapeXml,
  formatActivity,
  KINETIC_OVERPOTENTIAL,
  renderDiagramSvg,
  sampleText,
  wrapCaption,
} from "./diagram-svg";
export { renderDiagram } from "./diagram-svg";
export type { DiagramSvgOptions, KeyEntry } from "./diagram-svg";
export { boundaryEquations, equationText } from "./boundary-equations";
export { ligandEdges } from "./ligand-edges";
export { fitWindow, isClustered, zoomWindow } from "./view-window";
export { placeLabel, polygonsTouch, roomAt, touchingGroups } from "./label-placement";
export type { LabelPlacement, Pixel } from "./label-placement";
export { MARKER_RADIUS, MARKER_SHAPES, markerPath, markerSvg, traceMarker } from "./markers";
export type { MarkerShape, PathSink } from "./markers";
export {
  AXIS_TEXT,
  contrastRatio,
  LABEL_TEXT,
  MARKER_FILLS,
  MARKER_OUTLINE,
  PATTERN_INK,
  REGIME_WORDS,
  REGION_FILLS,
  regionFill,
  relativeLuminance,
  WATER_BAND,
  WATER_LINE,
  CURVE_INK,
  THRESHOLD_INK,
  GAP_FILL,
} from "./palette";
export { formulaSegments, segmentsText } from "./formula-markup";
export type { Segment } from "./formula-markup";
export { formatTotals, LIGAND_WORDS } from "./water-words";
export { curveGaps, curvePHs, curvePieces, CURVE_STEPS, solubilityCurve, spansAbove } from "./solubility-curve";
export type { CurvePoint, DissolvedEvaluator, SolubilityCurve } from "./solubility-curve";
export { decadeRange, decadeText, MAX_DECADES, renderSolubilityChart, solubilityLayout } from "./solubility-chart-svg";
export type { RenderedSolubilityChart, SolubilityChartOptions } from "./solubility-chart-svg";
export { curveConditions, formatMicrograms, solubilitySummary } from "./solubility-words";
