// Fixed geometry of the response chart in SVG user units (the SVG scales to its container).

/** Width and height of the chart, user units. */
export const PLOT_WIDTH = 760;
export const PLOT_HEIGHT = 380;

/** Margins around the plotting area; the top one holds the wavelength axis when it is shown. */
export const PLOT_MARGIN = { left: 64, right: 16, top: 40, bottom: 44 } as const;

/** The plotting area's edges, user units. */
export const PLOT_AREA = { x0: PLOT_MARGIN.left, x1: PLOT_WIDTH - PLOT_MARGIN.right, y0: PLOT_MARGIN.top, y1: PLOT_HEIGHT - PLOT_MARGIN.bottom } as const;
