;; scanTo of count-scan.ts in WebAssembly, for count arrays that live in a tally arena's memory
;; (random/tally-kernel.ts): the first sorted position p whose running count
;; counts[order[0]] + … + counts[order[p]] exceeds r (m − 1 when none does), the running count
;; through p stored at $out. Four positions are summed per step and the last group is then
;; walked one by one, as in count-scan.ts (statistics tests compare the two). WebAssembly
;; because this is the replicate loop's other hot loop (after the draws), and here it runs at
;; full speed from the first replicate instead of after V8 has optimized it — in a worker
;; thread that joined late, the first chunks ran two to five times slower.
;;
;; Memory: imported, the arena's (counts and order as i32 at byte offsets $cnt and $ord).
;; Built into count-scan-wasm.ts by scripts/build-wasm.mjs (wabt).
(module
  (import "env" "memory" (memory 1))
  (func (export "scanTo") (param $cnt i32) (param $ord i32) (param $r i32) (param $m i32) (param $out i32) (result i32)
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
)
