;; Whole chunks of replicates under the cluster bootstrap's first stage (schemes/cluster.ts), for
;; the statistics with a fast path there: the median (clusterMedian: a scan of the sorted rows
;; through their clusters' multiplicities, from the middle) and the mean (clusterSums: two sums
;; over the clusters). For each replicate the G multiplicities are cleared and the G cluster
;; draws tallied by the tally module's add16 (imported), as rng.addCounts(multiplicity, G, G,
;; null) draws them, and the statistic read as the JavaScript fast path reads it, operation for
;; operation — the same values (structured-schemes.test.ts). WebAssembly because in JavaScript
;; each thread's first chunks ran many times slower than its later ones until V8 had optimized
;; the loops (a worker's first chunk of the median ~50 ms on a cold start, ~3 ms warm).
;;
;; Memory: imported, a tally arena's (random/tally-kernel.ts): the multiplicities as i32 at $cnt,
;; the lane state at $st, the tables (cluster-chunks.ts places them) and the replicates written
;; as f64 at $out. Built into cluster-chunks-wasm.ts by scripts/build-wasm.mjs (wabt).
(module
  (import "env" "memory" (memory 1))
  (import "tally" "add16" (func $add16 (param i32 i32 i32 i32 i32 i32 i32)))

  ;; reps replicates of the median, the values clusterMedian returns: the resample size
  ;; total = Σ cnt[g]·size[g] and its count below the middle sorted row, Σ cnt[g]·below[g]
  ;; (i32 arrays at $size, $below); then from the middle row ($mid) down
  ;; or up to the first sorted row p whose running count Σ cnt[cs[q]], q ≤ p, exceeds
  ;; r = ⌊(total − 1)/2⌋ (cs: each sorted row's cluster, i32 at $cs; values f64 at $sorted);
  ;; for an even total, the mean with the next value (the same one when the count through p
  ;; passes r + 1, else the next row of a drawn cluster).
  (func (export "clusterMedianChunk") (param $cnt i32) (param $G i32) (param $thr i32) (param $st i32)
    (param $cs i32) (param $sorted i32) (param $m i32) (param $mid i32) (param $below i32) (param $size i32)
    (param $reps i32) (param $out i32)
    (local $b i32) (local $g i32) (local $c i32) (local $total i32) (local $cum i32) (local $r i32)
    (local $p i32) (local $w i32) (local $v f64)
    (block $done
      (loop $replicate
        (br_if $done (i32.ge_u (local.get $b) (local.get $reps)))
        (memory.fill (local.get $cnt) (i32.const 0) (i32.shl (local.get $G) (i32.const 2)))
        (call $add16 (local.get $cnt) (local.get $G) (local.get $thr) (local.get $G) (local.get $st) (i32.const 0) (i32.const 0))
        (local.set $total (i32.const 0))
        (local.set $cum (i32.const 0))
        (local.set $g (i32.const 0))
        (block $summed
          (loop $sum
            (br_if $summed (i32.ge_u (local.get $g) (local.get $G)))
            (local.set $c (i32.load (i32.add (local.get $cnt) (i32.shl (local.get $g) (i32.const 2)))))
            (local.set $total (i32.add (local.get $total) (i32.mul (local.get $c) (i32.load (i32.add (local.get $size) (i32.shl (local.get $g) (i32.const 2)))))))
            (local.set $cum (i32.add (local.get $cum) (i32.mul (local.get $c) (i32.load (i32.add (local.get $below) (i32.shl (local.get $g) (i32.const 2)))))))
            (local.set $g (i32.add (local.get $g) (i32.const 1)))
            (br $sum)))
        (local.set $r (i32.sub (i32.shr_u (i32.add (local.get $total) (i32.const 1)) (i32.const 1)) (i32.const 1)))
        (if (i32.gt_s (local.get $cum) (local.get $r))
          (then
            ;; down: while the count through row p − 1 still exceeds r
            (local.set $p (i32.sub (local.get $mid) (i32.const 1)))
            (block $low
              (loop $down
                (local.set $w (i32.load (i32.add (local.get $cnt) (i32.shl (i32.load (i32.add (local.get $cs) (i32.shl (local.get $p) (i32.const 2)))) (i32.const 2)))))
                (br_if $low (i32.le_s (i32.sub (local.get $cum) (local.get $w)) (local.get $r)))
                (local.set $cum (i32.sub (local.get $cum) (local.get $w)))
                (local.set $p (i32.sub (local.get $p) (i32.const 1)))
                (br $down))))
          (else
            (local.set $p (local.get $mid))
            (block $high
              (loop $up
                (br_if $high (i32.ge_s (local.get $p) (local.get $m)))
                (local.set $cum (i32.add (local.get $cum) (i32.load (i32.add (local.get $cnt) (i32.shl (i32.load (i32.add (local.get $cs) (i32.shl (local.get $p) (i32.const 2)))) (i32.const 2))))))
                (br_if $high (i32.gt_s (local.get $cum) (local.get $r)))
                (local.set $p (i32.add (local.get $p) (i32.const 1)))
                (br $up)))
            (if (i32.ge_s (local.get $p) (local.get $m)) (then (local.set $p (i32.sub (local.get $m) (i32.const 1)))))))
        (local.set $v (f64.load (i32.add (local.get $sorted) (i32.shl (local.get $p) (i32.const 3)))))
        (if (i32.and (i32.eqz (i32.and (local.get $total) (i32.const 1))) (i32.le_s (local.get $cum) (i32.add (local.get $r) (i32.const 1))))
          (then
            (local.set $p (i32.add (local.get $p) (i32.const 1)))
            (block $found
              (loop $next
                (br_if $found (i32.ge_s (local.get $p) (local.get $m)))
                (br_if $found (i32.gt_s
                  (i32.load (i32.add (local.get $cnt) (i32.shl (i32.load (i32.add (local.get $cs) (i32.shl (local.get $p) (i32.const 2)))) (i32.const 2))))
                  (i32.const 0)))
                (local.set $p (i32.add (local.get $p) (i32.const 1)))
                (br $next)))
            (if (i32.lt_s (local.get $p) (local.get $m))
              (then (local.set $v (f64.div (f64.add (local.get $v) (f64.load (i32.add (local.get $sorted) (i32.shl (local.get $p) (i32.const 3))))) (f64.const 2))))
              (else (local.set $v (f64.div (f64.add (local.get $v) (local.get $v)) (f64.const 2)))))))
        (f64.store (i32.add (local.get $out) (i32.shl (local.get $b) (i32.const 3))) (local.get $v))
        (local.set $b (i32.add (local.get $b) (i32.const 1)))
        (br $replicate))))

  ;; reps replicates of the mean, the values clusterSums (schemes/cluster.ts) returns: with the
  ;; cluster totals S_g and row counts m_g (f64 arrays at $sums, $rows), Σ cnt[g]·S_g divided by
  ;; Σ cnt[g]·m_g, both summed in cluster order.
  (func (export "clusterMeanChunk") (param $cnt i32) (param $G i32) (param $thr i32) (param $st i32)
    (param $sums i32) (param $rows i32) (param $reps i32) (param $out i32)
    (local $b i32) (local $g i32) (local $c f64) (local $s f64) (local $m f64)
    (block $done
      (loop $replicate
        (br_if $done (i32.ge_u (local.get $b) (local.get $reps)))
        (memory.fill (local.get $cnt) (i32.const 0) (i32.shl (local.get $G) (i32.const 2)))
        (call $add16 (local.get $cnt) (local.get $G) (local.get $thr) (local.get $G) (local.get $st) (i32.const 0) (i32.const 0))
        (local.set $s (f64.const 0))
        (local.set $m (f64.const 0))
        (local.set $g (i32.const 0))
        (block $summed
          (loop $sum
            (br_if $summed (i32.ge_u (local.get $g) (local.get $G)))
            (local.set $c (f64.convert_i32_s (i32.load (i32.add (local.get $cnt) (i32.shl (local.get $g) (i32.const 2))))))
            (local.set $s (f64.add (local.get $s) (f64.mul (local.get $c) (f64.load (i32.add (local.get $sums) (i32.shl (local.get $g) (i32.const 3)))))))
            (local.set $m (f64.add (local.get $m) (f64.mul (local.get $c) (f64.load (i32.add (local.get $rows) (i32.shl (local.get $g) (i32.const 3)))))))
            (local.set $g (i32.add (local.get $g) (i32.const 1)))
            (br $sum)))
        (f64.store (i32.add (local.get $out) (i32.shl (local.get $b) (i32.const 3))) (f64.div (local.get $s) (local.get $m)))
        (local.set $b (i32.add (local.get $b) (i32.const 1)))
        (br $replicate))))
)
