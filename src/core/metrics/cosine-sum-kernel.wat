;; The inner loop of `fillCosineSums` (cosine-sum-blocks.ts) as a WebAssembly function: the same
;; Chebyshev recurrence `c_{j+1} = 2cos(θ) c_j - c_{j-1}` per pair, the same sums in the same
;; order, so every value it writes is bit for bit the value the TypeScript loop writes. WebAssembly
;; rounds every f64 and f64x2 add, subtract and multiply to nearest, ties to even, and never fuses
;; a multiply with an add (WebAssembly Core Specification 2.0, 2022, "Floating-Point Operations"
;; in the numerics of execution; IEEE 754-2019 roundTiesToEven), which is what JavaScript numbers
;; do (ECMA-262, "The Number Type"). Only a NaN's payload may differ, and no JavaScript number
;; tells NaNs apart.
;; test/metrics/cosine-sum-kernel.test.ts holds the two to each other on random plans.
;;
;; Why it exists: the loop is most of a gate run's computing (87.6 million pair steps for the
;; 50-config W6 pull request). Run as JavaScript, it spends its first ~100 ms unoptimized, boxing
;; every intermediate double (1.4 GB of garbage for those 50 configs) while the optimizing
;; compiler takes 40-60 ms per attempt; compiled here, it runs at full speed from the first call,
;; two pairs per instruction, and allocates nothing.
;;
;; Layout, set up by cosine-sum-kernel.ts: three arrays of P doubles (2cos θ_i, the seeds c_0 and
;; c_{-1}) at byte offsets $twoCos, $now and $before, and the block of n sums at $out, which the
;; caller zeroes. Pairs are stored in lane order so that the TypeScript sums' association falls
;; out of whole-vector adds:
;;   a group of eight pairs 0..7 is stored as 0 4 1 5 2 6 3 7 (vectors (0,4) (1,5) (2,6) (3,7)):
;;     ((0,4) + (1,5)) + ((2,6) + (3,7)) = (((q0+q1) + (q2+q3)), ((q4+q5) + (q6+q7))),
;;     and lane 0 + lane 1 is the TypeScript `q0 + q1 + (q2 + q3) + (q4 + q5 + (q6 + q7))`;
;;   one group of four pairs 0..3 after the eights as 0 2 1 3: (0,2) + (1,3) = ((q0+q1), (q2+q3)),
;;     lane 0 + lane 1 is `q0 + q1 + (q2 + q3)`;
;;   the last P mod 4 pairs one by one, in order.
;; $p8 and $p4 are P rounded down to a multiple of eight and of four.
(module
  (memory (export "memory") 1)
  (func (export "fill")
    (param $p8 i32) (param $p4 i32) (param $p i32) (param $n i32)
    (param $twoCos i32) (param $now i32) (param $before i32) (param $out i32)
    (local $i i32) (local $at i32) (local $end i32) (local $o i32)
    (local $a1 v128) (local $a2 v128) (local $a3 v128) (local $a4 v128)
    (local $q1 v128) (local $q2 v128) (local $q3 v128) (local $q4 v128)
    (local $r1 v128) (local $r2 v128) (local $r3 v128) (local $r4 v128)
    (local $s v128) (local $t v128)
    (local $a f64) (local $q f64) (local $r f64) (local $x f64)
    (local.set $end (i32.add (local.get $out) (i32.shl (local.get $n) (i32.const 3))))

    ;; Groups of eight pairs.
    (block $eightsDone
      (loop $eights
        (br_if $eightsDone (i32.ge_u (local.get $i) (local.get $p8)))
        (local.set $o (i32.shl (local.get $i) (i32.const 3)))
        (local.set $a1 (v128.load offset=0 (i32.add (local.get $twoCos) (local.get $o))))
        (local.set $a2 (v128.load offset=16 (i32.add (local.get $twoCos) (local.get $o))))
        (local.set $a3 (v128.load offset=32 (i32.add (local.get $twoCos) (local.get $o))))
        (local.set $a4 (v128.load offset=48 (i32.add (local.get $twoCos) (local.get $o))))
        (local.set $q1 (v128.load offset=0 (i32.add (local.get $now) (local.get $o))))
        (local.set $q2 (v128.load offset=16 (i32.add (local.get $now) (local.get $o))))
        (local.set $q3 (v128.load offset=32 (i32.add (local.get $now) (local.get $o))))
        (local.set $q4 (v128.load offset=48 (i32.add (local.get $now) (local.get $o))))
        (local.set $r1 (v128.load offset=0 (i32.add (local.get $before) (local.get $o))))
        (local.set $r2 (v128.load offset=16 (i32.add (local.get $before) (local.get $o))))
        (local.set $r3 (v128.load offset=32 (i32.add (local.get $before) (local.get $o))))
        (local.set $r4 (v128.load offset=48 (i32.add (local.get $before) (local.get $o))))
        (local.set $at (local.get $out))
        (block $stepsDone
          (loop $steps
            (br_if $stepsDone (i32.ge_u (local.get $at) (local.get $end)))
            (local.set $s
              (f64x2.add
                (f64x2.add (local.get $q1) (local.get $q2))
                (f64x2.add (local.get $q3) (local.get $q4))))
            (f64.store (local.get $at)
              (f64.add
                (f64.load (local.get $at))
                (f64.add (f64x2.extract_lane 0 (local.get $s)) (f64x2.extract_lane 1 (local.get $s)))))
            (local.set $t (f64x2.sub (f64x2.mul (local.get $a1) (local.get $q1)) (local.get $r1)))
            (local.set $r1 (local.get $q1))
            (local.set $q1 (local.get $t))
            (local.set $t (f64x2.sub (f64x2.mul (local.get $a2) (local.get $q2)) (local.get $r2)))
            (local.set $r2 (local.get $q2))
            (local.set $q2 (local.get $t))
            (local.set $t (f64x2.sub (f64x2.mul (local.get $a3) (local.get $q3)) (local.get $r3)))
            (local.set $r3 (local.get $q3))
            (local.set $q3 (local.get $t))
            (local.set $t (f64x2.sub (f64x2.mul (local.get $a4) (local.get $q4)) (local.get $r4)))
            (local.set $r4 (local.get $q4))
            (local.set $q4 (local.get $t))
            (local.set $at (i32.add (local.get $at) (i32.const 8)))
            (br $steps)))
        (local.set $i (i32.add (local.get $i) (i32.const 8)))
        (br $eights)))

    ;; At most one group of four pairs.
    (if (i32.lt_u (local.get $i) (local.get $p4))
      (then
        (local.set $o (i32.shl (local.get $i) (i32.const 3)))
        (local.set $a1 (v128.load offset=0 (i32.add (local.get $twoCos) (local.get $o))))
        (local.set $a2 (v128.load offset=16 (i32.add (local.get $twoCos) (local.get $o))))
        (local.set $q1 (v128.load offset=0 (i32.add (local.get $now) (local.get $o))))
        (local.set $q2 (v128.load offset=16 (i32.add (local.get $now) (local.get $o))))
        (local.set $r1 (v128.load offset=0 (i32.add (local.get $before) (local.get $o))))
        (local.set $r2 (v128.load offset=16 (i32.add (local.get $before) (local.get $o))))
        (local.set $at (local.get $out))
        (block $stepsDone
          (loop $steps
            (br_if $stepsDone (i32.ge_u (local.get $at) (local.get $end)))
            (local.set $s (f64x2.add (local.get $q1) (local.get $q2)))
            (f64.store (local.get $at)
              (f64.add
                (f64.load (local.get $at))
                (f64.add (f64x2.extract_lane 0 (local.get $s)) (f64x2.extract_lane 1 (local.get $s)))))
            (local.set $t (f64x2.sub (f64x2.mul (local.get $a1) (local.get $q1)) (local.get $r1)))
            (local.set $r1 (local.get $q1))
            (local.set $q1 (local.get $t))
            (local.set $t (f64x2.sub (f64x2.mul (local.get $a2) (local.get $q2)) (local.get $r2)))
            (local.set $r2 (local.get $q2))
            (local.set $q2 (local.get $t))
            (local.set $at (i32.add (local.get $at) (i32.const 8)))
            (br $steps)))
        (local.set $i (i32.add (local.get $i) (i32.const 4)))))

    ;; The last pairs one by one.
    (block $onesDone
      (loop $ones
        (br_if $onesDone (i32.ge_u (local.get $i) (local.get $p)))
        (local.set $o (i32.shl (local.get $i) (i32.const 3)))
        (local.set $a (f64.load (i32.add (local.get $twoCos) (local.get $o))))
        (local.set $q (f64.load (i32.add (local.get $now) (local.get $o))))
        (local.set $r (f64.load (i32.add (local.get $before) (local.get $o))))
        (local.set $at (local.get $out))
        (block $stepsDone
          (loop $steps
            (br_if $stepsDone (i32.ge_u (local.get $at) (local.get $end)))
            (f64.store (local.get $at) (f64.add (f64.load (local.get $at)) (local.get $q)))
            (local.set $x (f64.sub (f64.mul (local.get $a) (local.get $q)) (local.get $r)))
            (local.set $r (local.get $q))
            (local.set $q (local.get $x))
            (local.set $at (i32.add (local.get $at) (i32.const 8)))
            (br $steps)))
        (local.set $i (i32.add (local.get $i) (i32.const 1)))
        (br $ones))))
)
