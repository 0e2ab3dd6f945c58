;; sortUnits (statistics/sort-units.ts) in WebAssembly: a stable sort of m keys by value, giving
;; each sorted position's key index and value — the same order as a stable comparison sort by
;; value then key index. WebAssembly because this runs once per preparation, in a cold start,
;; where JavaScript's loops would run unoptimized, and on both threads of the command line.
;;
;; How: a least-significant-digit radix sort (Knuth, TAOCP vol. 3, §5.2.5; stable, so equal keys
;; keep their index order) on 64-bit integer images of the keys whose unsigned order is the
;; numeric order: the key's IEEE-754 bits, with every bit flipped for a negative key and the
;; sign bit set for a positive one — the usual total-order trick for doubles. −0 is first made
;; +0 (−0 + 0 = +0), so the two compare equal, as with the comparison a − b. Keys are never NaN
;; (sortUnits sorts those by comparison). Eight passes of one byte each, all eight histograms
;; counted in one first pass; a pass whose byte is the same in every key moves nothing and is
;; skipped (the exponent bytes of keys of one magnitude, say).
;;
;; Only the key indices move; each pass reads its byte from the key itself (the keys fit in the
;; processor's cache), which keeps the memory at 24 bytes per key — here fresh memory costs more
;; to touch the first time than the extra reads.
;;
;; Memory (its own, sort-units.ts; fresh, so zeroed): at byte offset $keys m f64 keys (read);
;; $ia and $ib m i32 each (work); $hist 8 × 256 i32 (zero); $sorted m f64 (written: the keys in
;; sorted order). Returns the byte offset ($ia or $ib) of the m i32 key indices in sorted order.
;; Built into sort-positions-wasm.ts by scripts/build-wasm.mjs (wabt).
(module
  (memory (export "memory") 1)

  ;; The key at index $j as an unsigned 64-bit integer in numeric order (−0 as +0).
  (func $image (param $keys i32) (param $j i32) (result i64)
    (local $k i64)
    (local.set $k (i64.reinterpret_f64 (f64.add (f64.load (i32.add (local.get $keys) (i32.shl (local.get $j) (i32.const 3)))) (f64.const 0))))
    (select
      (i64.xor (local.get $k) (i64.const -1))
      (i64.or (local.get $k) (i64.const 0x8000000000000000))
      (i64.lt_s (local.get $k) (i64.const 0))))

  (func (export "sort") (param $m i32) (param $keys i32) (param $ia i32) (param $ib i32) (param $hist i32) (param $sorted i32) (result i32)
    (local $i i32) (local $j i32) (local $k i64) (local $s i32) (local $shift i64) (local $h i32) (local $d i32)
    (local $sum i32) (local $c i32) (local $p i32) (local $t i32)
    ;; the identity into $ia, and the eight byte histograms
    (block $counted
      (loop $count
        (br_if $counted (i32.ge_u (local.get $i) (local.get $m)))
        (local.set $k (call $image (local.get $keys) (local.get $i)))
        (i32.store (i32.add (local.get $ia) (i32.shl (local.get $i) (i32.const 2))) (local.get $i))
        (local.set $s (i32.const 0))
        (block $bytes
          (loop $byte
            (br_if $bytes (i32.ge_u (local.get $s) (i32.const 8)))
            (local.set $p (i32.add
              (i32.add (local.get $hist) (i32.shl (local.get $s) (i32.const 10)))
              (i32.shl (i32.and (i32.wrap_i64 (i64.shr_u (local.get $k) (i64.extend_i32_u (i32.shl (local.get $s) (i32.const 3))))) (i32.const 255)) (i32.const 2))))
            (i32.store (local.get $p) (i32.add (i32.load (local.get $p)) (i32.const 1)))
            (local.set $s (i32.add (local.get $s) (i32.const 1)))
            (br $byte)))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $count)))
    ;; one pass per byte, lowest first, from $ia into $ib, then the two swapped
    (local.set $s (i32.const 0))
    (block $passed
      (loop $pass
        (br_if $passed (i32.ge_u (local.get $s) (i32.const 8)))
        (br_if $passed (i32.eqz (local.get $m)))
        (local.set $h (i32.add (local.get $hist) (i32.shl (local.get $s) (i32.const 10))))
        (local.set $shift (i64.extend_i32_u (i32.shl (local.get $s) (i32.const 3))))
        ;; skipped when the first key's byte is every key's byte
        (local.set $d (i32.and (i32.wrap_i64 (i64.shr_u (call $image (local.get $keys) (i32.const 0)) (local.get $shift))) (i32.const 255)))
        (if (i32.ne (i32.load (i32.add (local.get $h) (i32.shl (local.get $d) (i32.const 2)))) (local.get $m))
          (then
            ;; counts → first positions (exclusive prefix sums)
            (local.set $sum (i32.const 0))
            (local.set $d (i32.const 0))
            (block $summed
              (loop $prefix
                (br_if $summed (i32.ge_u (local.get $d) (i32.const 256)))
                (local.set $p (i32.add (local.get $h) (i32.shl (local.get $d) (i32.const 2))))
                (local.set $c (i32.load (local.get $p)))
                (i32.store (local.get $p) (local.get $sum))
                (local.set $sum (i32.add (local.get $sum) (local.get $c)))
                (local.set $d (i32.add (local.get $d) (i32.const 1)))
                (br $prefix)))
            ;; each key index, in the current order, to the next free position of its key's byte
            (local.set $i (i32.const 0))
            (block $moved
              (loop $move
                (br_if $moved (i32.ge_u (local.get $i) (local.get $m)))
                (local.set $j (i32.load (i32.add (local.get $ia) (i32.shl (local.get $i) (i32.const 2)))))
                (local.set $p (i32.add (local.get $h)
                  (i32.shl (i32.and (i32.wrap_i64 (i64.shr_u (call $image (local.get $keys) (local.get $j)) (local.get $shift))) (i32.const 255)) (i32.const 2))))
                (local.set $c (i32.load (local.get $p)))
                (i32.store (local.get $p) (i32.add (local.get $c) (i32.const 1)))
                (i32.store (i32.add (local.get $ib) (i32.shl (local.get $c) (i32.const 2))) (local.get $j))
                (local.set $i (i32.add (local.get $i) (i32.const 1)))
                (br $move)))
            (local.set $t (local.get $ia)) (local.set $ia (local.get $ib)) (local.set $ib (local.get $t))))
        (local.set $s (i32.add (local.get $s) (i32.const 1)))
        (br $pass)))
    ;; the keys themselves (−0 kept as −0) in sorted order
    (local.set $i (i32.const 0))
    (block $copied
      (loop $copy
        (br_if $copied (i32.ge_u (local.get $i) (local.get $m)))
        (f64.store (i32.add (local.get $sorted) (i32.shl (local.get $i) (i32.const 3)))
          (f64.load (i32.add (local.get $keys)
            (i32.shl (i32.load (i32.add (local.get $ia) (i32.shl (local.get $i) (i32.const 2)))) (i32.const 3)))))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $copy)))
    (local.get $ia))
)
