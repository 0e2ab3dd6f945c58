;; The engine's hot loop, m ≤ 2¹⁶ (random/rng.ts, addCounts): q outputs of the Tyche-i
;; generator, each giving two indices below m from its 16-bit halves by Lemire's method, tallied
;; into a count array — exactly the draws, in the same order, as TycheI.direct16Batch and
;; via16Batch in rng.ts (random/tally16.test.ts checks it). WebAssembly because it runs the same
;; loop ~1.4× faster than V8's optimized JavaScript here, and is compiled before the first call
;; instead of being optimized part-way through it.
;;
;; Memory (imported, one block per count array, tally-kernel.ts): the generator state a, b, c, d
;; as four i32 at byte offset $st, the counts as i32 at $cnt, the units (via16) as i32 at $units.
;; Built into tally16-wasm.ts by scripts/build-wasm.mjs (wabt).
(module
  (import "env" "memory" (memory 1))

  ;; counts[x] += 1 for each accepted index x; returns how many were accepted.
  (func (export "direct16") (param $cnt i32) (param $m i32) (param $thr i32) (param $q i32) (param $st i32) (result i32)
    (local $a i32) (local $b i32) (local $c i32) (local $d i32) (local $i i32) (local $k i32)
    (local $x1 i32) (local $x2 i32) (local $g1 i32) (local $g2 i32) (local $p i32)
    (local.set $a (i32.load offset=0 (local.get $st)))
    (local.set $b (i32.load offset=4 (local.get $st)))
    (local.set $c (i32.load offset=8 (local.get $st)))
    (local.set $d (i32.load offset=12 (local.get $st)))
    (block $done
      (br_if $done (i32.eqz (local.get $q)))
      (loop $next
        ;; Tyche-i (Neves & Araujo 2011), as in rng.ts
        (local.set $b (i32.xor (i32.rotl (local.get $b) (i32.const 25)) (local.get $c)))
        (local.set $c (i32.sub (local.get $c) (local.get $d)))
        (local.set $d (i32.xor (i32.rotl (local.get $d) (i32.const 24)) (local.get $a)))
        (local.set $a (i32.sub (local.get $a) (local.get $b)))
        (local.set $b (i32.xor (i32.rotl (local.get $b) (i32.const 20)) (local.get $c)))
        (local.set $c (i32.sub (local.get $c) (local.get $d)))
        (local.set $d (i32.xor (i32.xor (i32.shl (local.get $d) (i32.const 16)) (i32.shr_u (local.get $c) (i32.const 16))) (local.get $a)))
        (local.set $a (i32.sub (local.get $a) (local.get $b)))
        ;; Lemire on each half: x = half·m; keep x >>> 16 when x mod 2¹⁶ ≥ (2¹⁶ − m) mod m.
        ;; A rejected half adds 0 to a valid cell (no branch).
        (local.set $x1 (i32.mul (i32.shr_u (local.get $a) (i32.const 16)) (local.get $m)))
        (local.set $x2 (i32.mul (i32.and (local.get $a) (i32.const 0xffff)) (local.get $m)))
        (local.set $g1 (i32.ge_u (i32.and (local.get $x1) (i32.const 0xffff)) (local.get $thr)))
        (local.set $g2 (i32.ge_u (i32.and (local.get $x2) (i32.const 0xffff)) (local.get $thr)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.shr_u (local.get $x1) (i32.const 16)) (i32.const 2))))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $g1)))
        (local.set $p (i32.add (local.get $cnt) (i32.shl (i32.shr_u (local.get $x2) (i32.const 16)) (i32.const 2))))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $g2)))
        (local.set $k (i32.add (local.get $k) (i32.add (local.get $g1) (local.get $g2))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br_if $next (i32.lt_u (local.get $i) (local.get $q)))))
    (i32.store offset=0 (local.get $st) (local.get $a))
    (i32.store offset=4 (local.get $st) (local.get $b))
    (i32.store offset=8 (local.get $st) (local.get $c))
    (i32.store offset=12 (local.get $st) (local.get $d))
    (local.get $k))

  ;; The same draws, each index x counted at counts[units[x]].
  (func (export "via16") (param $cnt i32) (param $m i32) (param $thr i32) (param $q i32) (param $st i32) (param $units i32) (result i32)
    (local $a i32) (local $b i32) (local $c i32) (local $d i32) (local $i i32) (local $k i32)
    (local $x1 i32) (local $x2 i32) (local $g1 i32) (local $g2 i32) (local $p i32)
    (local.set $a (i32.load offset=0 (local.get $st)))
    (local.set $b (i32.load offset=4 (local.get $st)))
    (local.set $c (i32.load offset=8 (local.get $st)))
    (local.set $d (i32.load offset=12 (local.get $st)))
    (block $done
      (br_if $done (i32.eqz (local.get $q)))
      (loop $next
        (local.set $b (i32.xor (i32.rotl (local.get $b) (i32.const 25)) (local.get $c)))
        (local.set $c (i32.sub (local.get $c) (local.get $d)))
        (local.set $d (i32.xor (i32.rotl (local.get $d) (i32.const 24)) (local.get $a)))
        (local.set $a (i32.sub (local.get $a) (local.get $b)))
        (local.set $b (i32.xor (i32.rotl (local.get $b) (i32.const 20)) (local.get $c)))
        (local.set $c (i32.sub (local.get $c) (local.get $d)))
        (local.set $d (i32.xor (i32.xor (i32.shl (local.get $d) (i32.const 16)) (i32.shr_u (local.get $c) (i32.const 16))) (local.get $a)))
        (local.set $a (i32.sub (local.get $a) (local.get $b)))
        (local.set $x1 (i32.mul (i32.shr_u (local.get $a) (i32.const 16)) (local.get $m)))
        (local.set $x2 (i32.mul (i32.and (local.get $a) (i32.const 0xffff)) (local.get $m)))
        (local.set $g1 (i32.ge_u (i32.and (local.get $x1) (i32.const 0xffff)) (local.get $thr)))
        (local.set $g2 (i32.ge_u (i32.and (local.get $x2) (i32.const 0xffff)) (local.get $thr)))
        (local.set $p (i32.add (local.get $cnt)
          (i32.shl (i32.load (i32.add (local.get $units) (i32.shl (i32.shr_u (local.get $x1) (i32.const 16)) (i32.const 2)))) (i32.const 2))))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $g1)))
        (local.set $p (i32.add (local.get $cnt)
          (i32.shl (i32.load (i32.add (local.get $units) (i32.shl (i32.shr_u (local.get $x2) (i32.const 16)) (i32.const 2)))) (i32.const 2))))
        (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (local.get $g2)))
        (local.set $k (i32.add (local.get $k) (i32.add (local.get $g1) (local.get $g2))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br_if $next (i32.lt_u (local.get $i) (local.get $q)))))
    (i32.store offset=0 (local.get $st) (local.get $a))
    (i32.store offset=4 (local.get $st) (local.get $b))
    (i32.store offset=8 (local.get $st) (local.get $c))
    (i32.store offset=12 (local.get $st) (local.get $d))
    (local.get $k))
)
