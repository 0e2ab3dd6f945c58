;; The second half of sortUnits (statistics/sort-units.ts): given the keys in unit order and the
;; same keys sorted ascending (by the typed array's own sort), each key j takes the next free
;; place among the positions of its value, found by binary search (the first position p with
;; ascending[p] ≥ key) — a stable sort by value then unit, without a comparator. Then the keys
;; in that order. WebAssembly because this runs once per preparation, in a cold start, where
;; JavaScript's loops would run unoptimized (~7 ms for 10⁴ keys here; well under 1 ms here).
;; Keys are never NaN (sortUnits sorts those by comparison). −0 and +0 compare equal (f64.lt).
;;
;; Memory (its own, sort-units.ts): at byte offsets $asc and $keys m f64 each, $sorted m f64
;; (written), $taken m i32 (zeroed by the caller), $order m i32 (written: key indices).
;; Built into sort-positions-wasm.ts by scripts/build-wasm.mjs (wabt).
(module
  (memory (export "memory") 1)

  (func (export "positions") (param $asc i32) (param $keys i32) (param $m i32) (param $taken i32) (param $order i32) (param $sorted i32)
    (local $j i32) (local $v f64) (local $lo i32) (local $hi i32) (local $mid i32) (local $t i32)
    (block $done
      (loop $unit
        (br_if $done (i32.ge_u (local.get $j) (local.get $m)))
        (local.set $v (f64.load (i32.add (local.get $keys) (i32.shl (local.get $j) (i32.const 3)))))
        ;; lowerBound(ascending, v)
        (local.set $lo (i32.const 0))
        (local.set $hi (local.get $m))
        (block $found
          (loop $search
            (br_if $found (i32.ge_u (local.get $lo) (local.get $hi)))
            (local.set $mid (i32.shr_u (i32.add (local.get $lo) (local.get $hi)) (i32.const 1)))
            (if (f64.lt (f64.load (i32.add (local.get $asc) (i32.shl (local.get $mid) (i32.const 3)))) (local.get $v))
              (then (local.set $lo (i32.add (local.get $mid) (i32.const 1))))
              (else (local.set $hi (local.get $mid))))
            (br $search)))
        ;; order[lo + taken[lo]++] = j
        (local.set $t (i32.add (local.get $taken) (i32.shl (local.get $lo) (i32.const 2))))
        (i32.store
          (i32.add (local.get $order) (i32.shl (i32.add (local.get $lo) (i32.load (local.get $t))) (i32.const 2)))
          (local.get $j))
        (i32.store (local.get $t) (i32.add (i32.load (local.get $t)) (i32.const 1)))
        (local.set $j (i32.add (local.get $j) (i32.const 1)))
        (br $unit)))
    ;; sorted[i] = keys[order[i]]
    (local.set $j (i32.const 0))
    (block $copied
      (loop $copy
        (br_if $copied (i32.ge_u (local.get $j) (local.get $m)))
        (f64.store (i32.add (local.get $sorted) (i32.shl (local.get $j) (i32.const 3)))
          (f64.load (i32.add (local.get $keys)
            (i32.shl (i32.load (i32.add (local.get $order) (i32.shl (local.get $j) (i32.const 2)))) (i32.const 3)))))
        (local.set $j (i32.add (local.get $j) (i32.const 1)))
        (br $copy))))
)
