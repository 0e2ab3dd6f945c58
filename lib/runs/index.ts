export { cancelRun, getRunView, planKey, requestRun, runLab, type RunRequest } from './service';
export { canonicalJson, runKey } from './key';
export type { RunError, RunView, UnreadyView } from './types';
