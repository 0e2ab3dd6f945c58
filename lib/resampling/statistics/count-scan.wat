;; scanTo of count-scan.ts in WebAssembly, for count arrays that live in a tally arena's memory
;; (random/tally-kernel.ts): the first sorted position p whose running count
;; counts[order[0]] + … + counts[order[p]] exceeds r (m − 1 when none does), the running count
;; through p stored at $out. Four positions are summed per step and the last group is then
;; walked one by one, as in count-scan.ts (statistics tests compare the two). WebAssembly
;; because this is the replicate loop's other hot loop (after the draws), and here it runs at
;; full speed from the first replicate instead of after V8 has optimized it — in a worker
;; thread that joined late, the first chunks ran two to five times slower.
;;
;; orderChunk draws and evaluates whole replicates of the ordinary bootstrap of a median or a
;; type-7 quantile (count-scan.ts, orderChunkRunner): for each, the counts are cleared, all n
;; draws tallied by the tally module's add16 (imported), and the statistic read from the
;; counts exactly as medianFromCounts / quantileFromCounts read it — one call per chunk of
;; replicates instead of a dozen JavaScript calls per replicate, which V8 otherwise compiles
;; optimized in every thread on a cold start (~35 ms of its one background thread's CPU per
;; thread on the benchmark request, beside the draws).
;;
;; Memory: imported, the arena's (counts and order as i32 at byte offsets $cnt and $ord,
;; sorted values as f64 at $sorted, the replicates written as f64 at $out, 4 bytes of scratch
;; at $scr (the running count) and 8 at $scr + 8 (a value)). Built into count-scan-wasm.ts by scripts/build-wasm.mjs (wabt).
(module
  (import "env" "memory" (memory 1))
  (import "tally" "add16" (func $add16 (param i32 i32 i32 i32 i32 i32 i32)))
  (func $scanTo (export "scanTo") (param $cnt i32) (param $ord i32) (param $r i32) (param $m i32) (param $out i32) (result i32)
    (local $cum i32) (local $p i32) (local $s i32) (local $m4 i32) (local $o i32)
    (local.set $m4 (i32.sub (local.get $m) (i32.const 3)))
    (block $b4
      (loop $l4
        (br_if $b4 (i32.ge_s (local.get $p) (local.get $m4)))
        (local.set $o (i32.add (local.get $ord) (i32.shl (local.get $p) (i32.const 2))))
        (local.set $s (i32.add
          (i32.add (i32.load (i32.add (local.get $cnt) (i32.shl (i32.load offset=0 (local.get $o)) (i32.const 2))))
                   (i32.load (i32.add (local.get $cnt) (i32.shl (i32.load offset=4 (local.get $o)) (i32.const 2)))))
          (i32.add (i32.load (i32.add (local.get $cnt) (i32.shl (i32.load offset=8 (local.get $o)) (i32.const 2))))
                   (i32.load (i32.add (local.get $cnt) (i32.shl (i32.load offset=12 (local.get $o)) (i32.const 2)))))))
        (br_if $b4 (i32.gt_s (i32.add (local.get $cum) (local.get $s)) (local.get $r)))
        (local.set $cum (i32.add (local.get $cum) (local.get $s)))
        (local.set $p (i32.add (local.get $p) (i32.const 4)))
        (br $l4)))
    (block $b1
      (loop $l1
        (br_if $b1 (i32.ge_s (local.get $p) (local.get $m)))
        (local.set $cum (i32.add (local.get $cum) (i32.load (i32.add (local.get $cnt) (i32.shl (i32.load (i32.add (local.get $ord) (i32.shl (local.get $p) (i32.const 2)))) (i32.const 2))))))
        (br_if $b1 (i32.gt_s (local.get $cum) (local.get $r)))
        (local.set $p (i32.add (local.get $p) (i32.const 1)))
        (br $l1)))
    (i32.store (local.get $out) (local.get $cum))
    (select (local.get $p) (i32.sub (local.get $m) (i32.const 1)) (i32.lt_s (local.get $p) (local.get $m))))

  ;; The value at rank r (0-based); with $second, also the value at rank r + 1 (ranksPair in
  ;; count-scan.ts): the same value when the running count through r's position reaches past
  ;; r + 1, else the next position with a positive count (the same value when none). Returns
  ;; the value at r, or with $second the value at r + 1 and the one at r stored at $scr + 8.
  (func $pair (param $cnt i32) (param $ord i32) (param $sorted i32) (param $r i32) (param $m i32) (param $scr i32) (param $second i32) (result f64)
    (local $p i32) (local $v0 f64)
    (local.set $p (call $scanTo (local.get $cnt) (local.get $ord) (local.get $r) (local.get $m) (local.get $scr)))
    (local.set $v0 (f64.load (i32.add (local.get $sorted) (i32.shl (local.get $p) (i32.const 3)))))
    (if (i32.eqz (local.get $second)) (then (return (local.get $v0))))
    (f64.store offset=8 (local.get $scr) (local.get $v0))
    (if (i32.gt_s (i32.load (local.get $scr)) (i32.add (local.get $r) (i32.const 1))) (then (return (local.get $v0))))
    (local.set $p (i32.add (local.get $p) (i32.const 1)))
    (block $found
      (loop $next
        (br_if $found (i32.ge_s (local.get $p) (local.get $m)))
        (br_if $found (i32.gt_s
          (i32.load (i32.add (local.get $cnt) (i32.shl (i32.load (i32.add (local.get $ord) (i32.shl (local.get $p) (i32.const 2)))) (i32.const 2))))
          (i32.const 0)))
        (local.set $p (i32.add (local.get $p) (i32.const 1)))
        (br $next)))
    (if (result f64) (i32.lt_s (local.get $p) (local.get $m))
      (then (f64.load (i32.add (local.get $sorted) (i32.shl (local.get $p) (i32.const 3)))))
      (else (local.get $v0))))

  ;; reps replicates: median when $quantile is 0 (R's median: the middle value, or the mean of
  ;; the two middle ones), else the type-7 quantile at $p; all m units drawn from m, lanes at $st.
  (func (export "orderChunk") (param $cnt i32) (param $m i32) (param $thr i32) (param $st i32) (param $ord i32) (param $sorted i32)
    (param $reps i32) (param $out i32) (param $scr i32) (param $quantile i32) (param $p f64)
    (local $b i32) (local $r i32) (local $v f64) (local $a f64) (local $c f64) (local $index f64) (local $lo f64) (local $h f64)
    (block $done
      (loop $replicate
        (br_if $done (i32.ge_u (local.get $b) (local.get $reps)))
        (memory.fill (local.get $cnt) (i32.const 0) (i32.shl (local.get $m) (i32.const 2)))
        (call $add16 (local.get $cnt) (local.get $m) (local.get $thr) (local.get $m) (local.get $st) (i32.const 0) (i32.const 0))
        (if (i32.eqz (local.get $quantile))
          (then
            (if (i32.and (local.get $m) (i32.const 1))
              (then
                (local.set $v (call $pair (local.get $cnt) (local.get $ord) (local.get $sorted)
                  (i32.shr_u (i32.sub (local.get $m) (i32.const 1)) (i32.const 1)) (local.get $m) (local.get $scr) (i32.const 0))))
              (else
                (local.set $r (i32.sub (i32.shr_u (local.get $m) (i32.const 1)) (i32.const 1)))
                (local.set $c (call $pair (local.get $cnt) (local.get $ord) (local.get $sorted) (local.get $r) (local.get $m) (local.get $scr) (i32.const 1)))
                (local.set $a (f64.load offset=8 (local.get $scr)))
                (local.set $v (f64.div (f64.add (local.get $a) (local.get $c)) (f64.const 2))))))
          (else
            (local.set $index (f64.mul (f64.convert_i32_s (i32.sub (local.get $m) (i32.const 1))) (local.get $p)))
            (local.set $lo (f64.floor (local.get $index)))
            (local.set $r (i32.trunc_f64_s (local.get $lo)))
            (if (f64.eq (local.get $index) (local.get $lo))
              (then (local.set $v (call $pair (local.get $cnt) (local.get $ord) (local.get $sorted) (local.get $r) (local.get $m) (local.get $scr) (i32.const 0))))
              (else
                (local.set $c (call $pair (local.get $cnt) (local.get $ord) (local.get $sorted) (local.get $r) (local.get $m) (local.get $scr) (i32.const 1)))
                (local.set $a (f64.load offset=8 (local.get $scr)))
                (if (f64.eq (local.get $a) (local.get $c))
                  (then (local.set $v (local.get $a)))
                  (else
                    (local.set $h (f64.sub (local.get $index) (local.get $lo)))
                    (local.set $v (f64.add (f64.mul (f64.sub (f64.const 1) (local.get $h)) (local.get $a)) (f64.mul (local.get $h) (local.get $c))))))))))
        (f64.store (i32.add (local.get $out) (i32.shl (local.get $b) (i32.const 3))) (local.get $v))
        (local.set $b (i32.add (local.get $b) (i32.const 1)))
        (br $replicate))))
)
