/**
 * Sizes (in SVG user units) and colours of the fit chart, shared by the server-side SVG and the browser chart.
 * Colours meet a 3:1 contrast against white for the curve and points (WCAG 2.1, 1.4.11 non-text contrast).
 */
export const CHART_LAYOUT = {
  width: 760,
  mainHeight: 340,
  residualHeight: 150,
  margin: { top: 12, right: 20, bottom: 44, left: 72 },
} as const;

export const CHART_COLORS = {
  prediction: '#dce8f3',
  confidence: '#a9c6e0',
  curve: '#1f5a8a',
  point: '#1d232a',
  excluded: '#b83232',
  zero: '#6b7580',
  preview: '#9a4a00',
  previewBand: '#f3dcc4',
} as const;
