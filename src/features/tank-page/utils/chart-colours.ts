// SVG needs literal colours: these are the palette's tide, kelp, ember and alarm steps.
export const CHART_COLOURS = {
  ok: '#2f8a57',
  watch: '#c7781a',
  critical: '#c62839',
  watchDot: '#a55f0f',
  criticalDot: '#a71d2e',
  tank: '#214e60',
  system: '#31768e',
  grid: '#d5e9ee',
  axis: '#265f75',
  bar: '#265f75',
} as const

export const BAND_FILL_OPACITY = 0.16
