// Diagnostics for data that are not a plain random sample: serial correlation in row
// order and repeated ids. Pure functions; no Node or DOM APIs.
export { autocovariance } from './autocovariance';
export { lag1Autocorrelation } from './lag1-autocorrelation';
export { serialDependence, type SerialDependence } from './serial-dependence';
export { repeatedIds, type RepeatedIds } from './repeated-ids';
