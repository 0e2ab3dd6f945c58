/**
 * Engine version, recorded in every response's provenance. Bump it whenever a response for
 * the same request could change (a new generator, chunk size, quantile or tie convention),
 * so cached runs keyed on it are recomputed.
 */
export const ENGINE_VERSION = 'margin-resampling/1.2.0';
