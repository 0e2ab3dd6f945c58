import type { Worker } from 'node:worker_threads';

export const INLINE_DRAWS: number;
export const COMMAND_LINE_WORKER_DRAWS: number;
export function guessDraws(input: unknown): number;
export function looksLarge(input: unknown): boolean;
export function startEarly(argv: string[], workerFile: string): void;
export function takeEarlyRequest(file: string): { input: unknown; large: boolean } | null;
export function dropEarlyWorker(): void;
export function takeEarlyWorker(file: string): { file: string; worker: Worker; isReady: () => boolean } | null;
