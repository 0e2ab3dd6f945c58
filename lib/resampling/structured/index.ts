// Resampling steps for structured data — block, stationary and cluster resamples as counts,
// least-squares residual resampling, and a bootstrap test of a mean. Pure functions; the
// random source is passed in; no Node or DOM APIs.
export { addMovingBlockCounts, addMovingBlockCountsFromStarts, blockCount } from './moving-block-counts';
export { addStationaryCounts } from './stationary-counts';
export { addClusterCounts, addClusterMultiplicities } from './cluster-counts';
export { leastSquaresLine, type LeastSquaresLine } from './least-squares-line';
export { residualPool, fillResidualResponse } from './residual-pool';
export { bootstrapMeanTest, type BootstrapMeanTest, type MeanTestAlternative } from './bootstrap-mean-test';
export { blockSums, movingBlockMean, movingBlockMeanFromStarts, stationaryMean, type BlockSums } from './block-sums';
