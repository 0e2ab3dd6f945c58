export { liveValueNode } from './node';
export { liveValueAttrs, type LiveValueAttrs } from './schema';
export { formatLive, formatNumber } from './format';
