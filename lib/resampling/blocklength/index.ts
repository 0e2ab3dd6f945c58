// Automatic block length for block bootstraps of dependent series (Politis & White 2004,
// corrected by Patton, Politis & White 2009). Pure functions; no Node or DOM APIs.
export { BlockLengthError } from './block-length-error';
export { flatTopLagWindow } from './flat-top-lag-window';
export { blockLengthFromAutocovariances, type BlockLengthPair } from './block-length-from-autocovariances';
export { ar1OptimalBlockLength } from './ar1-optimal-block-length';
export { optimalBlockLength, type OptimalBlockLength, type OptimalBlockLengthOptions } from './optimal-block-length';
