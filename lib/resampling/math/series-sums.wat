;; The engine's single passes over a series of doubles that run once per request (math/series.ts
;; says which): on the command line they run on a cold start, where V8 has not yet optimized the
;; JavaScript loops and each pass over 10^4 values cost milliseconds (the moments of the
;; replicates, the lag-1 autocorrelation and the tie count together ~15 ms of the ~20 ms after
;; the draws, here). Each function adds the same terms in the same order as the JavaScript it
;; stands for, so the results are the same bits (math/series.test.ts compares them).
;;
;; Memory: its own; the series as f64 at byte offset $x, results at $out.
;; Built into series-sums-wasm.ts by scripts/build-wasm.mjs (wabt).
(module
  (memory (export "memory") 1)

  ;; sum of (x[i] - shift), i = 0 .. n-1 (moments.ts, first pass)
  (func (export "shiftedSum") (param $x i32) (param $n i32) (param $shift f64) (result f64)
    (local $i i32) (local $s f64)
    (block $done
      (loop $next
        (br_if $done (i32.ge_u (local.get $i) (local.get $n)))
        (local.set $s (f64.add (local.get $s)
          (f64.sub (f64.load (i32.add (local.get $x) (i32.shl (local.get $i) (i32.const 3)))) (local.get $shift))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next)))
    (local.get $s))

  ;; d = x[i] - shift - meanShifted; sums of d^2, d^2*d, d^2*d^2 to out[0], out[1], out[2]
  ;; (moments.ts, second pass)
  (func (export "centralSums") (param $x i32) (param $n i32) (param $shift f64) (param $meanShifted f64) (param $out i32)
    (local $i i32) (local $d f64) (local $d2 f64) (local $m2 f64) (local $m3 f64) (local $m4 f64)
    (block $done
      (loop $next
        (br_if $done (i32.ge_u (local.get $i) (local.get $n)))
        (local.set $d (f64.sub (f64.sub (f64.load (i32.add (local.get $x) (i32.shl (local.get $i) (i32.const 3)))) (local.get $shift)) (local.get $meanShifted)))
        (local.set $d2 (f64.mul (local.get $d) (local.get $d)))
        (local.set $m2 (f64.add (local.get $m2) (local.get $d2)))
        (local.set $m3 (f64.add (local.get $m3) (f64.mul (local.get $d2) (local.get $d))))
        (local.set $m4 (f64.add (local.get $m4) (f64.mul (local.get $d2) (local.get $d2))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next)))
    (f64.store offset=0 (local.get $out) (local.get $m2))
    (f64.store offset=8 (local.get $out) (local.get $m3))
    (f64.store offset=16 (local.get $out) (local.get $m4)))

  ;; the plain sum in order to out[0] (series-mean.ts) and -1; or, when a value is not finite,
  ;; the index of the first such value (out[0] then unset)
  (func (export "finiteSum") (param $x i32) (param $n i32) (param $out i32) (result i32)
    (local $i i32) (local $v f64) (local $s f64)
    (block $done
      (loop $next
        (br_if $done (i32.ge_u (local.get $i) (local.get $n)))
        (local.set $v (f64.load (i32.add (local.get $x) (i32.shl (local.get $i) (i32.const 3)))))
        ;; v - v is 0 for a finite v, NaN for NaN and for either infinity
        (if (f64.ne (f64.sub (local.get $v) (local.get $v)) (f64.const 0))
          (then (return (local.get $i))))
        (local.set $s (f64.add (local.get $s) (local.get $v)))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $next)))
    (f64.store (local.get $out) (local.get $s))
    (i32.const -1))

  ;; lag-1 sums about the mean (lag1-autocorrelation.ts): here = x[0] - mean; for t < n-1,
  ;; next = x[t+1] - mean, s0 += here^2, s1 += here*next; then s0 += here^2 of the last.
  ;; n >= 1. s0, s1 to out[0], out[1].
  (func (export "lag1Sums") (param $x i32) (param $n i32) (param $mean f64) (param $out i32)
    (local $t i32) (local $here f64) (local $next f64) (local $s0 f64) (local $s1 f64)
    (local.set $here (f64.sub (f64.load (local.get $x)) (local.get $mean)))
    (block $done
      (loop $step
        (br_if $done (i32.ge_u (local.get $t) (i32.sub (local.get $n) (i32.const 1))))
        (local.set $next (f64.sub (f64.load (i32.add (local.get $x) (i32.shl (i32.add (local.get $t) (i32.const 1)) (i32.const 3)))) (local.get $mean)))
        (local.set $s0 (f64.add (local.get $s0) (f64.mul (local.get $here) (local.get $here))))
        (local.set $s1 (f64.add (local.get $s1) (f64.mul (local.get $here) (local.get $next))))
        (local.set $here (local.get $next))
        (local.set $t (i32.add (local.get $t) (i32.const 1)))
        (br $step)))
    (local.set $s0 (f64.add (local.get $s0) (f64.mul (local.get $here) (local.get $here))))
    (f64.store offset=0 (local.get $out) (local.get $s0))
    (f64.store offset=8 (local.get $out) (local.get $s1)))

  ;; runs of equal values in a sorted series (heavy-ties.ts): the number of distinct values to
  ;; out[0] and the longest run to out[1] (as i32); NaN equals NaN, -0 equals +0.
  (func (export "runs") (param $x i32) (param $n i32) (param $out i32)
    (local $i i32) (local $j i32) (local $v f64) (local $w f64) (local $distinct i32) (local $top i32)
    (block $done
      (loop $run
        (br_if $done (i32.ge_u (local.get $i) (local.get $n)))
        (local.set $v (f64.load (i32.add (local.get $x) (i32.shl (local.get $i) (i32.const 3)))))
        (local.set $j (i32.add (local.get $i) (i32.const 1)))
        (block $ended
          (loop $same
            (br_if $ended (i32.ge_u (local.get $j) (local.get $n)))
            (local.set $w (f64.load (i32.add (local.get $x) (i32.shl (local.get $j) (i32.const 3)))))
            (br_if $ended (i32.eqz (i32.or (f64.eq (local.get $w) (local.get $v))
              (i32.and (f64.ne (local.get $w) (local.get $w)) (f64.ne (local.get $v) (local.get $v))))))
            (local.set $j (i32.add (local.get $j) (i32.const 1)))
            (br $same)))
        (local.set $distinct (i32.add (local.get $distinct) (i32.const 1)))
        (if (i32.gt_s (i32.sub (local.get $j) (local.get $i)) (local.get $top))
          (then (local.set $top (i32.sub (local.get $j) (local.get $i)))))
        (local.set $i (local.get $j))
        (br $run)))
    (i32.store offset=0 (local.get $out) (local.get $distinct))
    (i32.store offset=4 (local.get $out) (local.get $top)))
)
