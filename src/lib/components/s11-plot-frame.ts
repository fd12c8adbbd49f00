// The S11 plot's frame in SVG units, shared by the plot and the page load that thins the trace to fit it.

export const S11_PLOT_WIDTH = 760;
export const S11_PLOT_HEIGHT = 360;
export const S11_PLOT_MARGIN = { top: 28, right: 18, bottom: 44, left: 54 } as const;

/** Pixel columns of the drawing area at the plot's own size: a trace needs at most 2 points per column (688 → 1 376 points). */
export const S11_PLOT_COLUMNS = S11_PLOT_WIDTH - S11_PLOT_MARGIN.left - S11_PLOT_MARGIN.right;
