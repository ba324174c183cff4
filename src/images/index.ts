/**
 * Charts for fincheck: plain data in (typed arrays, strings), SVG text out, PNG through resvg.
 * The module knows nothing about fins beyond the labels it is given.
 *
 *   lineChart   temperature profiles, heat flow / loss panels (series, legend notes, point annotations)
 *   fieldChart  2-D field on a structured boundary-fitted grid: true outline, colour bar, labelled iso-lines
 *   mapChart    scalar over a regular (linear/log) parameter grid, diverging colours, labelled contour levels
 *   svgToPng    rasterise with the bundled DejaVu Sans; chartBytes for "--out FILE.png|FILE.svg"
 */

export { lineChart } from './line-chart.js';
export type { LineChartSpec, LinePanel, LineSeries, PointAnnotation, LegendPlacement, ChartResult, PanelGeometry } from './line-chart.js';

export { fieldChart, gridLayout } from './field-chart.js';
export type { FieldChartSpec, FieldChartResult, StructuredGrid, EdgeLabels } from './field-chart.js';

export { barChart } from './bar-chart.js';
export type { BarChartSpec, BarChartResult, BarReferenceLine } from './bar-chart.js';
export { tornadoChart } from './tornado-chart.js';
export type { TornadoBar, TornadoChartSpec } from './tornado-chart.js';

export { mapChart } from './map-chart.js';
export type { MapChartSpec, MapChartResult, MapLevel, MapPoint } from './map-chart.js';

export { svgToPng, chartBytes, fontFiles, fontFilesFor, subsetFontFiles } from './render.js';
export type { RenderOptions, ChartFormat } from './render.js';
export { svgsToPngs } from './render-several.js';
export type { RenderSeveralOptions } from './render-several.js';
export { readPngDpi, setPngDpi } from './png-dpi.js';

export { contourLines, placeLineLabel, polylineLength } from './contour.js';
export type { Polyline, LabelAnchor } from './contour.js';
export type { GridLayout } from './field-raster.js';

export { linearTicks, logTicks, niceNumber, formatTick, formatLogTick } from './ticks.js';
export type { LinearTicks, LogTicks, TickMode } from './ticks.js';
export { project, unproject, makeAxis } from './scales.js';
export type { Scale, ScaleKind, Axis } from './scales.js';

export { getColormap, colormapRgb, colormapHex, colormapLut } from './colormaps.js';
export type { Colormap, ColormapName, ColormapKind } from './colormaps.js';

export type { LineStyle } from './series-styles.js';
export type { MarkerShape } from './markers.js';
export type { Rect } from './layout.js';
export { defaultWidth, defaultHeight } from './theme.js';
// Building blocks for the charts that other layers draw themselves (plots, map).
export { drawAxes, xAxisMargin, yAxisMargin } from './axes.js';
export { fieldImage } from './field-layer.js';
export { drawHeader } from './layout.js';
export { drawLegend, legendSize } from './legend.js';
export { markerElement, markerPathData } from './markers.js';
export { dashArray, defaultSeriesStyle, okabeItoColours } from './series-styles.js';
export { el, fmt, polylinePathData, svgDocument, textEl } from './svg.js';
export { textWidth, truncateToWidth } from './text-metrics.js';
export { fontSize, gap, ink } from './theme.js';
export type { LegendEntry } from './legend.js';
export { prettyUnit } from './unit-text.js';
