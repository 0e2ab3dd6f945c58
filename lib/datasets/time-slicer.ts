/**
 * Lets other work run — other requests on the server, rendering in a browser — every ~15 ms
 * of a long computation, so parsing or hashing a 50 MB table never stalls the event loop for
 * longer than that.
 */
export class TimeSlicer {
  private last = performance.now();
  constructor(private readonly sliceMs = 15) {}

  /** Resolves at once inside a slice; at its end, after one turn of the event loop. Returns whether it yielded. */
  async maybeYield(): Promise<boolean> {
    if (performance.now() - this.last < this.sliceMs) return false;
    await new Promise<void>((resolve) => (typeof setImmediate === 'function' ? setImmediate(resolve) : setTimeout(resolve, 0)));
    this.last = performance.now();
    return true;
  }
}
