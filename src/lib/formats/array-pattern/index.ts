// Array-pattern writer: the array-factor figures and plot-ready cuts as JSON.
export * from './build';
