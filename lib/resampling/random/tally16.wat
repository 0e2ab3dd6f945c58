;; The engine's hot loop, m ≤ 2¹⁶ (random/rng.ts, addCounts): q steps of four Tyche-i generators
;; run side by side in the four 32-bit lanes of a SIMD vector, each lane's output giving two
;; indices below m from its 16-bit halves by Lemire's method, tallied into a count array —
;; exactly the draws of TycheI.direct16Batch and via16Batch in rng.ts (random/tally16.test.ts
;; checks it). Four independent generators instead of one: one Tyche-i step is a chain of eight
;; dependent operations, so a single generator keeps the processor waiting on it (~1.4 ns per
;; index here even without the tally), while four in one vector cost about the same per step
;; and give four outputs; with the tally, ~0.85 ns per index against ~1.7 for one generator.
;; WebAssembly because it is compiled before the first call instead of being optimized part-way
;; through it, and because JavaScript has no SIMD.
;;
;; add16 is a whole addCounts call (TycheI.addJs16 and lastFew16 in rng.ts): the
;; batches of whole steps, then the last few indices one at a time, so a replicate's draws are
;; one call from JavaScript instead of a handful plus a JavaScript tail.
;;
;; Memory (imported, one block per count array, tally-kernel.ts): the four generators' state as
;; four vectors a, b, c, d (lane j of each = generator j) at byte offset $st (64 bytes) and 16
;; bytes of scratch after it, the counts as i32 at $cnt, the units (via16) as i32 at $units.
;; Built into tally16-wasm.ts by scripts/build-wasm.mjs (wabt).
(module
  (import "env" "memory" (memory 1))

  ;; counts[x] += 1 for each accepted index x; returns how many were accepted.
  (func $direct16 (export "direct16") (param $cnt i32) (param $m i32) (param $thr i32) (param $q i32) (param $st i32) (result i32)
    (local $a v128) (local $b v128) (local $c v128) (local $d v128)
    (local $xh v128) (local $xl v128) (local $gh v128) (local $gl v128)
    (local $mv v128) (local $tv v128) (local $low v128)
    (local $i i32) (local $k i32) (local $p i32) (local $t i32)
    (local.set $a (v128.load offset=0 (local.get $st)))
    (local.set $b (v128.load offset=16 (local.get $st)))
    (local.set $c (v128.load offset=32 (local.get $st)))
    (local.set $d (v128.load offset=48 (local.get $st)))
    (local.set $mv (i32x4.splat (local.get $m)))
    (local.set $tv (i32x4.splat (local.get $thr)))
    (local.set $low (i32x4.splat (i32.const 0xffff)))
    (block $done
      (br_if $done (i32.eqz (local.get $q)))
      (loop $next
        ;; one Tyche-i step in each lane (rotations as shift-or: WebAssembly has no i32x4 rotate)
        (local.set $b (v128.xor (v128.or (i32x4.shl (local.get $b) (i32.const 25)) (i32x4.shr_u (local.get $b) (i32.const 7))) (local.get $c)))
        (local.set $c (i32x4.sub (local.get $c) (local.get $d)))
        (local.set $d (v128.xor (v128.or (i32x4.shl (local.get $d) (i32.const 24)) (i32x4.shr_u (local.get $d) (i32.const 8))) (local.get $a)))
        (local.set $a (i32x4.sub (local.get $a) (local.get $b)))
        (local.set $b (v128.xor (v128.or (i32x4.shl (local.get $b) (i32.const 20)) (i32x4.shr_u (local.get $b) (i32.const 12))) (local.get $c)))
        (local.set $c (i32x4.sub (local.get $c) (local.get $d)))
        (local.set $d (v128.xor (v128.xor (i32x4.shl (local.get $d) (i32.const 16)) (i32x4.shr_u (local.get $c) (i32.const 16))) (local.get $a)))
        (local.set $a (i32x4.sub (local.get $a) (local.get $b)))
        ;; Lemire on each half of each lane's output: x = half·m; keep x >>> 16 when
        ;; x mod 2¹⁶ ≥ (2¹⁶ − m) mod m. The comparison gives all ones (accept) or zero per lane;
        ;; a rejected half adds 0 to a valid cell (no branch).
        (local.set $xh (i32x4.mul (i32x4.shr_u (local.get $a) (i32.const 16)) (local.get $mv)))
        (local.set $xl (i32x4.mul (v128.and (local.get $a) (local.get $low)) (local.get $mv)))
        (local.set $gh (i32x4.ge_u (v128.and (local.get $xh) (local.get $low)) (local.get $tv)))
        (local.set $gl (i32x4.ge_u (v128.and (local.get $xl) (local.get $low)) (local.get $tv)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.shr_u (i32x4.extract_lane 0 (local.get $xh)) (i32.const 16)) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 0 (local.get $gh)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.shr_u (i32x4.extract_lane 0 (local.get $xl)) (i32.const 16)) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 0 (local.get $gl)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.shr_u (i32x4.extract_lane 1 (local.get $xh)) (i32.const 16)) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 1 (local.get $gh)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.shr_u (i32x4.extract_lane 1 (local.get $xl)) (i32.const 16)) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 1 (local.get $gl)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.shr_u (i32x4.extract_lane 2 (local.get $xh)) (i32.const 16)) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 2 (local.get $gh)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.shr_u (i32x4.extract_lane 2 (local.get $xl)) (i32.const 16)) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 2 (local.get $gl)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.shr_u (i32x4.extract_lane 3 (local.get $xh)) (i32.const 16)) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 3 (local.get $gh)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.shr_u (i32x4.extract_lane 3 (local.get $xl)) (i32.const 16)) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 3 (local.get $gl)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br_if $next (i32.lt_u (local.get $i) (local.get $q)))))
    (v128.store offset=0 (local.get $st) (local.get $a))
    (v128.store offset=16 (local.get $st) (local.get $b))
    (v128.store offset=32 (local.get $st) (local.get $c))
    (v128.store offset=48 (local.get $st) (local.get $d))
    (local.get $k))

  ;; The same draws, each index x counted at counts[units[x]].
  (func $via16 (export "via16") (param $cnt i32) (param $m i32) (param $thr i32) (param $q i32) (param $st i32) (param $units i32) (result i32)
    (local $a v128) (local $b v128) (local $c v128) (local $d v128)
    (local $xh v128) (local $xl v128) (local $gh v128) (local $gl v128)
    (local $mv v128) (local $tv v128) (local $low v128)
    (local $i i32) (local $k i32) (local $p i32) (local $t i32)
    (local.set $a (v128.load offset=0 (local.get $st)))
    (local.set $b (v128.load offset=16 (local.get $st)))
    (local.set $c (v128.load offset=32 (local.get $st)))
    (local.set $d (v128.load offset=48 (local.get $st)))
    (local.set $mv (i32x4.splat (local.get $m)))
    (local.set $tv (i32x4.splat (local.get $thr)))
    (local.set $low (i32x4.splat (i32.const 0xffff)))
    (block $done
      (br_if $done (i32.eqz (local.get $q)))
      (loop $next
        ;; one Tyche-i step in each lane (rotations as shift-or: WebAssembly has no i32x4 rotate)
        (local.set $b (v128.xor (v128.or (i32x4.shl (local.get $b) (i32.const 25)) (i32x4.shr_u (local.get $b) (i32.const 7))) (local.get $c)))
        (local.set $c (i32x4.sub (local.get $c) (local.get $d)))
        (local.set $d (v128.xor (v128.or (i32x4.shl (local.get $d) (i32.const 24)) (i32x4.shr_u (local.get $d) (i32.const 8))) (local.get $a)))
        (local.set $a (i32x4.sub (local.get $a) (local.get $b)))
        (local.set $b (v128.xor (v128.or (i32x4.shl (local.get $b) (i32.const 20)) (i32x4.shr_u (local.get $b) (i32.const 12))) (local.get $c)))
        (local.set $c (i32x4.sub (local.get $c) (local.get $d)))
        (local.set $d (v128.xor (v128.xor (i32x4.shl (local.get $d) (i32.const 16)) (i32x4.shr_u (local.get $c) (i32.const 16))) (local.get $a)))
        (local.set $a (i32x4.sub (local.get $a) (local.get $b)))
        ;; Lemire on each half of each lane's output: x = half·m; keep x >>> 16 when
        ;; x mod 2¹⁶ ≥ (2¹⁶ − m) mod m. The comparison gives all ones (accept) or zero per lane;
        ;; a rejected half adds 0 to a valid cell (no branch).
        (local.set $xh (i32x4.mul (i32x4.shr_u (local.get $a) (i32.const 16)) (local.get $mv)))
        (local.set $xl (i32x4.mul (v128.and (local.get $a) (local.get $low)) (local.get $mv)))
        (local.set $gh (i32x4.ge_u (v128.and (local.get $xh) (local.get $low)) (local.get $tv)))
        (local.set $gl (i32x4.ge_u (v128.and (local.get $xl) (local.get $low)) (local.get $tv)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.load (i32.add (local.get $units) (i32.shl (i32.shr_u (i32x4.extract_lane 0 (local.get $xh)) (i32.const 16)) (i32.const 2)))) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 0 (local.get $gh)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.load (i32.add (local.get $units) (i32.shl (i32.shr_u (i32x4.extract_lane 0 (local.get $xl)) (i32.const 16)) (i32.const 2)))) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 0 (local.get $gl)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.load (i32.add (local.get $units) (i32.shl (i32.shr_u (i32x4.extract_lane 1 (local.get $xh)) (i32.const 16)) (i32.const 2)))) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 1 (local.get $gh)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.load (i32.add (local.get $units) (i32.shl (i32.shr_u (i32x4.extract_lane 1 (local.get $xl)) (i32.const 16)) (i32.const 2)))) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 1 (local.get $gl)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.load (i32.add (local.get $units) (i32.shl (i32.shr_u (i32x4.extract_lane 2 (local.get $xh)) (i32.const 16)) (i32.const 2)))) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 2 (local.get $gh)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.load (i32.add (local.get $units) (i32.shl (i32.shr_u (i32x4.extract_lane 2 (local.get $xl)) (i32.const 16)) (i32.const 2)))) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 2 (local.get $gl)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.load (i32.add (local.get $units) (i32.shl (i32.shr_u (i32x4.extract_lane 3 (local.get $xh)) (i32.const 16)) (i32.const 2)))) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 3 (local.get $gh)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.load (i32.add (local.get $units) (i32.shl (i32.shr_u (i32x4.extract_lane 3 (local.get $xl)) (i32.const 16)) (i32.const 2)))) (i32.const 2))))
        (local.set $t (i32.and (i32x4.extract_lane 3 (local.get $gl)) (i32.const 1)))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $t)))
        (local.set $k (i32.add (local.get $k) (local.get $t)))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br_if $next (i32.lt_u (local.get $i) (local.get $q)))))
    (v128.store offset=0 (local.get $st) (local.get $a))
    (v128.store offset=16 (local.get $st) (local.get $b))
    (v128.store offset=32 (local.get $st) (local.get $c))
    (v128.store offset=48 (local.get $st) (local.get $d))
    (local.get $k))

  ;; times draws below m into counts (through units when $via is 1): batches of
  ;; q = ⌊(times − k)/8⌋ whole steps while q > 0, then the tail.
  (func (export "add16") (param $cnt i32) (param $m i32) (param $thr i32) (param $times i32) (param $st i32) (param $units i32) (param $via i32)
    (local $k i32) (local $q i32)
    (block $batched
      (loop $batch
        (local.set $q (i32.shr_u (i32.sub (local.get $times) (local.get $k)) (i32.const 3)))
        (br_if $batched (i32.eqz (local.get $q)))
        (local.set $k (i32.add (local.get $k)
          (if (result i32) (local.get $via)
            (then (call $via16 (local.get $cnt) (local.get $m) (local.get $thr) (local.get $q) (local.get $st) (local.get $units)))
            (else (call $direct16 (local.get $cnt) (local.get $m) (local.get $thr) (local.get $q) (local.get $st))))))
        (br $batch)))
    (if (i32.lt_u (local.get $k) (local.get $times))
      (then (call $tail (local.get $cnt) (local.get $m) (local.get $thr) (i32.sub (local.get $times) (local.get $k)) (local.get $st) (local.get $units) (local.get $via)))))

  ;; The last `need` indices one at a time (rng.ts, lastFew16): step the lanes, then the eight
  ;; candidates in order (lane 0 high half, lane 0 low half, lane 1 high half, …), counting the
  ;; accepted ones until none is needed; the rest of that step is dropped.
  (func $tail (param $cnt i32) (param $m i32) (param $thr i32) (param $need i32) (param $st i32) (param $units i32) (param $via i32)
    (local $a v128) (local $b v128) (local $c v128) (local $d v128)
    (local $j i32) (local $w i32) (local $x i32) (local $i i32) (local $p i32)
    (local.set $a (v128.load offset=0 (local.get $st)))
    (local.set $b (v128.load offset=16 (local.get $st)))
    (local.set $c (v128.load offset=32 (local.get $st)))
    (local.set $d (v128.load offset=48 (local.get $st)))
    (block $done
      (loop $step
        (br_if $done (i32.eqz (local.get $need)))
        (local.set $b (v128.xor (v128.or (i32x4.shl (local.get $b) (i32.const 25)) (i32x4.shr_u (local.get $b) (i32.const 7))) (local.get $c)))
        (local.set $c (i32x4.sub (local.get $c) (local.get $d)))
        (local.set $d (v128.xor (v128.or (i32x4.shl (local.get $d) (i32.const 24)) (i32x4.shr_u (local.get $d) (i32.const 8))) (local.get $a)))
        (local.set $a (i32x4.sub (local.get $a) (local.get $b)))
        (local.set $b (v128.xor (v128.or (i32x4.shl (local.get $b) (i32.const 20)) (i32x4.shr_u (local.get $b) (i32.const 12))) (local.get $c)))
        (local.set $c (i32x4.sub (local.get $c) (local.get $d)))
        (local.set $d (v128.xor (v128.xor (i32x4.shl (local.get $d) (i32.const 16)) (i32x4.shr_u (local.get $c) (i32.const 16))) (local.get $a)))
        (local.set $a (i32x4.sub (local.get $a) (local.get $b)))
        ;; the four outputs to the scratch cells, read back one by one
        (v128.store offset=64 (local.get $st) (local.get $a))
        (local.set $j (i32.const 0))
        (block $stepped
          (loop $candidate
            (br_if $stepped (i32.or (i32.eqz (local.get $need)) (i32.ge_u (local.get $j) (i32.const 8))))
            (local.set $w (i32.load offset=64 (i32.add (local.get $st) (i32.shl (i32.shr_u (local.get $j) (i32.const 1)) (i32.const 2)))))
            (local.set $x (i32.mul
              (select (i32.and (local.get $w) (i32.const 0xffff)) (i32.shr_u (local.get $w) (i32.const 16)) (i32.and (local.get $j) (i32.const 1)))
              (local.get $m)))
            (if (i32.ge_u (i32.and (local.get $x) (i32.const 0xffff)) (local.get $thr))
              (then
                (local.set $i (i32.shr_u (local.get $x) (i32.const 16)))
                (if (local.get $via)
                  (then (local.set $i (i32.load (i32.add (local.get $units) (i32.shl (local.get $i) (i32.const 2)))))))
                (local.set $p (i32.add (local.get $cnt) (i32.shl (local.get $i) (i32.const 2))))
                (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (i32.const 1)))
                (local.set $need (i32.sub (local.get $need) (i32.const 1)))))
            (local.set $j (i32.add (local.get $j) (i32.const 1)))
            (br $candidate)))
        (br $step)))
    (v128.store offset=0 (local.get $st) (local.get $a))
    (v128.store offset=16 (local.get $st) (local.get $b))
    (v128.store offset=32 (local.get $st) (local.get $c))
    (v128.store offset=48 (local.get $st) (local.get $d)))
)
