;; The engine's hot loops: each year, every member's total forcing and its two-layer step.
;; Written in WebAssembly text with 128-bit SIMD: two members per instruction (f64x2).
;; Compiled by scripts/build-kernels.mjs (wabt) into member-kernels-wasm.ts; a test checks
;; that the committed bytes are this file's.
;;
;; Why here and not in TypeScript (measured, W1, 100,000 members, one thread, same process):
;; forcing plus step ran at ~8 ns per member-year in V8's best JavaScript code (after a
;; warm-up) and at ~2.6 ns here, from the first call.
;;
;; Same numbers as the TypeScript it replaced, bit for bit: WebAssembly float arithmetic is
;; IEEE 754 double with round-to-nearest and no fused multiply-add, and every sum below
;; is taken in the same order as the TypeScript wrote it (left to right). Minima and maxima
;; use pmin/pmax, which are `b < a ? b : a` and `a < b ? b : a`, the same comparisons as
;; `if (x < min) min = x`.
;;
;; Arrays: every address is a byte address in the shared memory (kernel-memory.ts), of
;; member 0 of a per-member Float64Array; a kernel works on members [lo, lo + n). Members
;; are taken in pairs; an odd last member goes through the same arithmetic one at a time.

(module
  (import "env" "memory" (memory 1 65536 shared))

  ;; The plan's per-member arrays, as addresses at these offsets of a "frame" (an Int32Array
  ;; of the plan written by ensemble/kernel-layout.ts): the propagator [[a11 a12] [a21 a22]], [b1 b2]
  ;; (exact one-year step, two-layer-propagator.ts), the state, the baseline and window sums,
  ;; the next threshold, λ and (ε − 1)γ for the imbalance, and the list of crossing members.
  ;;   0 a11   4 a12   8 a21  12 a22  16 b1  20 b2  24 upper  28 deep  32 baselineMean
  ;;  36 windowMean  40 nextThreshold  44 lambda  48 extraUptake  52 crossed (Int32Array)
  ;;  56 m11  60 m12  64 m21  68 m22  72 r1  76 r2
  ;; where [[m11 m12] [m21 m22]] = ∫₀¹ e^{As} ds and (r1, r2) = A⁻²(e^A − I − A)(1/C, 0): the
  ;; MEAN state over the year is that matrix times the state at the year's start plus r·F
  ;; (two-layer-propagator.ts), exactly, for forcing F held over the year.

  ;; forcing: out[m] = base + Σ_j scale_j[m] · coefficient_j for m in [lo, lo + n), the sum
  ;; over j = 0 … width − 1 in order. width is 0, 4, 8 or 12 (pathway-forcing.ts pads with an
  ;; all-zero column). columns: address of width i32 column addresses; coefficient j is the
  ;; f64 at coefficients + j · stride (the pathway's slotBase, year t). If extremes is not 0,
  ;; folds the min and max of the written values into the f64 pair there.
  (func (export "forcing")
      (param $out i32) (param $lo i32) (param $n i32) (param $base f64)
      (param $columns i32) (param $coefficients i32) (param $stride i32) (param $width i32)
      (param $extremes i32)
    (local $first i32) (local $end i32) (local $i i32) (local $j i32)
    (local $s0 i32) (local $s1 i32) (local $s2 i32) (local $s3 i32)
    (local $k0 f64) (local $k1 f64) (local $k2 f64) (local $k3 f64)
    (local $c0 v128) (local $c1 v128) (local $c2 v128) (local $c3 v128) (local $sum v128)
    (local $x f64) (local $min v128) (local $max v128)
    (local.set $first (i32.shl (local.get $lo) (i32.const 3)))
    (local.set $out (i32.add (local.get $out) (local.get $first)))
    (local.set $end (i32.and (i32.shl (local.get $n) (i32.const 3)) (i32.const -16)))
    ;; Four columns at a time; the first group starts from base, later ones from out.
    (local.set $j (i32.const 0))
    (block $groups_done
      (loop $groups
        (br_if $groups_done (i32.ge_u (local.get $j) (local.get $width)))
        (local.set $s0 (i32.add (i32.load offset=0 (i32.add (local.get $columns) (i32.shl (local.get $j) (i32.const 2)))) (local.get $first)))
        (local.set $s1 (i32.add (i32.load offset=4 (i32.add (local.get $columns) (i32.shl (local.get $j) (i32.const 2)))) (local.get $first)))
        (local.set $s2 (i32.add (i32.load offset=8 (i32.add (local.get $columns) (i32.shl (local.get $j) (i32.const 2)))) (local.get $first)))
        (local.set $s3 (i32.add (i32.load offset=12 (i32.add (local.get $columns) (i32.shl (local.get $j) (i32.const 2)))) (local.get $first)))
        (local.set $k0 (f64.load (i32.add (local.get $coefficients) (i32.mul (local.get $stride) (local.get $j)))))
        (local.set $k1 (f64.load (i32.add (local.get $coefficients) (i32.mul (local.get $stride) (i32.add (local.get $j) (i32.const 1))))))
        (local.set $k2 (f64.load (i32.add (local.get $coefficients) (i32.mul (local.get $stride) (i32.add (local.get $j) (i32.const 2))))))
        (local.set $k3 (f64.load (i32.add (local.get $coefficients) (i32.mul (local.get $stride) (i32.add (local.get $j) (i32.const 3))))))
        (local.set $c0 (f64x2.splat (local.get $k0)))
        (local.set $c1 (f64x2.splat (local.get $k1)))
        (local.set $c2 (f64x2.splat (local.get $k2)))
        (local.set $c3 (f64x2.splat (local.get $k3)))
        (local.set $i (i32.const 0))
        (block $pairs_done
          (loop $pairs
            (br_if $pairs_done (i32.ge_u (local.get $i) (local.get $end)))
            (local.set $sum
              (if (result v128) (i32.eqz (local.get $j))
                (then (f64x2.splat (local.get $base)))
                (else (v128.load (i32.add (local.get $out) (local.get $i))))))
            (local.set $sum (f64x2.add (local.get $sum) (f64x2.mul (v128.load (i32.add (local.get $s0) (local.get $i))) (local.get $c0))))
            (local.set $sum (f64x2.add (local.get $sum) (f64x2.mul (v128.load (i32.add (local.get $s1) (local.get $i))) (local.get $c1))))
            (local.set $sum (f64x2.add (local.get $sum) (f64x2.mul (v128.load (i32.add (local.get $s2) (local.get $i))) (local.get $c2))))
            (local.set $sum (f64x2.add (local.get $sum) (f64x2.mul (v128.load (i32.add (local.get $s3) (local.get $i))) (local.get $c3))))
            (v128.store (i32.add (local.get $out) (local.get $i)) (local.get $sum))
            (local.set $i (i32.add (local.get $i) (i32.const 16)))
            (br $pairs)))
        (if (i32.and (local.get $n) (i32.const 1))
          (then
            (local.set $x
              (if (result f64) (i32.eqz (local.get $j))
                (then (local.get $base))
                (else (f64.load (i32.add (local.get $out) (local.get $i))))))
            (local.set $x (f64.add (local.get $x) (f64.mul (f64.load (i32.add (local.get $s0) (local.get $i))) (local.get $k0))))
            (local.set $x (f64.add (local.get $x) (f64.mul (f64.load (i32.add (local.get $s1) (local.get $i))) (local.get $k1))))
            (local.set $x (f64.add (local.get $x) (f64.mul (f64.load (i32.add (local.get $s2) (local.get $i))) (local.get $k2))))
            (local.set $x (f64.add (local.get $x) (f64.mul (f64.load (i32.add (local.get $s3) (local.get $i))) (local.get $k3))))
            (f64.store (i32.add (local.get $out) (local.get $i)) (local.get $x))))
        (local.set $j (i32.add (local.get $j) (i32.const 4)))
        (br $groups)))
    ;; No varying scale: every member gets base.
    (if (i32.eqz (local.get $width))
      (then
        (local.set $i (i32.const 0))
        (block $fill_done
          (loop $fill
            (br_if $fill_done (i32.ge_u (local.get $i) (i32.shl (local.get $n) (i32.const 3))))
            (f64.store (i32.add (local.get $out) (local.get $i)) (local.get $base))
            (local.set $i (i32.add (local.get $i) (i32.const 8)))
            (br $fill)))))
    (if (i32.eqz (local.get $extremes)) (then (return)))
    (local.set $min (f64x2.splat (f64.const inf)))
    (local.set $max (f64x2.splat (f64.const -inf)))
    (local.set $i (i32.const 0))
    (block $scan_done
      (loop $scan
        (br_if $scan_done (i32.ge_u (local.get $i) (local.get $end)))
        (local.set $sum (v128.load (i32.add (local.get $out) (local.get $i))))
        (local.set $min (f64x2.pmin (local.get $min) (local.get $sum)))
        (local.set $max (f64x2.pmax (local.get $max) (local.get $sum)))
        (local.set $i (i32.add (local.get $i) (i32.const 16)))
        (br $scan)))
    (if (i32.and (local.get $n) (i32.const 1))
      (then
        (local.set $sum (f64x2.splat (f64.load (i32.add (local.get $out) (local.get $i)))))
        (local.set $min (f64x2.pmin (local.get $min) (local.get $sum)))
        (local.set $max (f64x2.pmax (local.get $max) (local.get $sum)))))
    (call $fold (local.get $extremes) (local.get $min) (local.get $max)))

  ;; Folds the lanes of min and max into the f64 pair at `at` (min, then max), each by a
  ;; strict comparison with what is there, as `if (x < min) min = x` would.
  (func $fold (param $at i32) (param $min v128) (param $max v128)
    (local $x f64)
    (local.set $x (f64x2.extract_lane 0
      (f64x2.pmin (local.get $min) (i8x16.shuffle 8 9 10 11 12 13 14 15 0 1 2 3 4 5 6 7 (local.get $min) (local.get $min)))))
    (if (f64.lt (local.get $x) (f64.load (local.get $at)))
      (then (f64.store (local.get $at) (local.get $x))))
    (local.set $x (f64x2.extract_lane 0
      (f64x2.pmax (local.get $max) (i8x16.shuffle 8 9 10 11 12 13 14 15 0 1 2 3 4 5 6 7 (local.get $max) (local.get $max)))))
    (if (f64.gt (local.get $x) (f64.load offset=8 (local.get $at)))
      (then (f64.store offset=8 (local.get $at) (local.get $x)))))

  ;; First pass: members [lo, lo + n) one year on under forcing[m] (upper' = a11·upper +
  ;; a12·deep + b1·F, deep' = a21·upper + a22·deep + b2·F); the year's mean upper-layer
  ;; temperature (m11·upper + m12·deep + r1·F, from the state at the year's start) is added to
  ;; the baseline sum if inBaseline and to the window sum if inWindow.
  (func (export "baselineStep")
      (param $frame i32) (param $lo i32) (param $n i32) (param $forcing i32)
      (param $inBaseline i32) (param $inWindow i32)
    (local $first i32) (local $end i32) (local $i i32)
    (local $a11 i32) (local $a12 i32) (local $a21 i32) (local $a22 i32) (local $b1 i32) (local $b2 i32)
    (local $up i32) (local $dp i32) (local $bl i32) (local $win i32)
    (local $m11 i32) (local $m12 i32) (local $r1 i32) (local $summed i32)
    (local $x v128) (local $y v128) (local $f v128) (local $next v128) (local $mean v128)
    (local $sx f64) (local $sy f64) (local $sf f64) (local $snext f64) (local $smean f64)
    (local.set $first (i32.shl (local.get $lo) (i32.const 3)))
    (local.set $a11 (i32.add (i32.load offset=0 (local.get $frame)) (local.get $first)))
    (local.set $a12 (i32.add (i32.load offset=4 (local.get $frame)) (local.get $first)))
    (local.set $a21 (i32.add (i32.load offset=8 (local.get $frame)) (local.get $first)))
    (local.set $a22 (i32.add (i32.load offset=12 (local.get $frame)) (local.get $first)))
    (local.set $b1 (i32.add (i32.load offset=16 (local.get $frame)) (local.get $first)))
    (local.set $b2 (i32.add (i32.load offset=20 (local.get $frame)) (local.get $first)))
    (local.set $up (i32.add (i32.load offset=24 (local.get $frame)) (local.get $first)))
    (local.set $dp (i32.add (i32.load offset=28 (local.get $frame)) (local.get $first)))
    (local.set $bl (i32.add (i32.load offset=32 (local.get $frame)) (local.get $first)))
    (local.set $win (i32.add (i32.load offset=36 (local.get $frame)) (local.get $first)))
    (local.set $m11 (i32.add (i32.load offset=56 (local.get $frame)) (local.get $first)))
    (local.set $m12 (i32.add (i32.load offset=60 (local.get $frame)) (local.get $first)))
    (local.set $r1 (i32.add (i32.load offset=72 (local.get $frame)) (local.get $first)))
    (local.set $summed (i32.or (local.get $inBaseline) (local.get $inWindow)))
    (local.set $forcing (i32.add (local.get $forcing) (local.get $first)))
    (local.set $end (i32.and (i32.shl (local.get $n) (i32.const 3)) (i32.const -16)))
    (local.set $i (i32.const 0))
    (block $done
      (loop $pairs
        (br_if $done (i32.ge_u (local.get $i) (local.get $end)))
        (local.set $x (v128.load (i32.add (local.get $up) (local.get $i))))
        (local.set $y (v128.load (i32.add (local.get $dp) (local.get $i))))
        (local.set $f (v128.load (i32.add (local.get $forcing) (local.get $i))))
        (local.set $next
          (f64x2.add
            (f64x2.add
              (f64x2.mul (v128.load (i32.add (local.get $a11) (local.get $i))) (local.get $x))
              (f64x2.mul (v128.load (i32.add (local.get $a12) (local.get $i))) (local.get $y)))
            (f64x2.mul (v128.load (i32.add (local.get $b1) (local.get $i))) (local.get $f))))
        (v128.store (i32.add (local.get $up) (local.get $i)) (local.get $next))
        (v128.store (i32.add (local.get $dp) (local.get $i))
          (f64x2.add
            (f64x2.add
              (f64x2.mul (v128.load (i32.add (local.get $a21) (local.get $i))) (local.get $x))
              (f64x2.mul (v128.load (i32.add (local.get $a22) (local.get $i))) (local.get $y)))
            (f64x2.mul (v128.load (i32.add (local.get $b2) (local.get $i))) (local.get $f))))
        (if (local.get $summed)
          (then
            (local.set $mean
              (f64x2.add
                (f64x2.add
                  (f64x2.mul (v128.load (i32.add (local.get $m11) (local.get $i))) (local.get $x))
                  (f64x2.mul (v128.load (i32.add (local.get $m12) (local.get $i))) (local.get $y)))
                (f64x2.mul (v128.load (i32.add (local.get $r1) (local.get $i))) (local.get $f))))
            (if (local.get $inBaseline)
              (then (v128.store (i32.add (local.get $bl) (local.get $i))
                (f64x2.add (v128.load (i32.add (local.get $bl) (local.get $i))) (local.get $mean)))))
            (if (local.get $inWindow)
              (then (v128.store (i32.add (local.get $win) (local.get $i))
                (f64x2.add (v128.load (i32.add (local.get $win) (local.get $i))) (local.get $mean)))))))
        (local.set $i (i32.add (local.get $i) (i32.const 16)))
        (br $pairs)))
    (if (i32.and (local.get $n) (i32.const 1))
      (then
        (local.set $sx (f64.load (i32.add (local.get $up) (local.get $i))))
        (local.set $sy (f64.load (i32.add (local.get $dp) (local.get $i))))
        (local.set $sf (f64.load (i32.add (local.get $forcing) (local.get $i))))
        (local.set $snext
          (f64.add
            (f64.add
              (f64.mul (f64.load (i32.add (local.get $a11) (local.get $i))) (local.get $sx))
              (f64.mul (f64.load (i32.add (local.get $a12) (local.get $i))) (local.get $sy)))
            (f64.mul (f64.load (i32.add (local.get $b1) (local.get $i))) (local.get $sf))))
        (f64.store (i32.add (local.get $up) (local.get $i)) (local.get $snext))
        (f64.store (i32.add (local.get $dp) (local.get $i))
          (f64.add
            (f64.add
              (f64.mul (f64.load (i32.add (local.get $a21) (local.get $i))) (local.get $sx))
              (f64.mul (f64.load (i32.add (local.get $a22) (local.get $i))) (local.get $sy)))
            (f64.mul (f64.load (i32.add (local.get $b2) (local.get $i))) (local.get $sf))))
        (if (local.get $summed)
          (then
            (local.set $smean
              (f64.add
                (f64.add
                  (f64.mul (f64.load (i32.add (local.get $m11) (local.get $i))) (local.get $sx))
                  (f64.mul (f64.load (i32.add (local.get $m12) (local.get $i))) (local.get $sy)))
                (f64.mul (f64.load (i32.add (local.get $r1) (local.get $i))) (local.get $sf))))
            (if (local.get $inBaseline)
              (then (f64.store (i32.add (local.get $bl) (local.get $i))
                (f64.add (f64.load (i32.add (local.get $bl) (local.get $i))) (local.get $smean)))))
            (if (local.get $inWindow)
              (then (f64.store (i32.add (local.get $win) (local.get $i))
                (f64.add (f64.load (i32.add (local.get $win) (local.get $i))) (local.get $smean))))))))))

  ;; Reporting pass: members [lo, lo + n) one year on under forcing[m], as baselineStep; writes
  ;; anomaly[m] = (the year's mean upper-layer temperature) − baselineMean[m] and, if imbalance
  ;; is not 0, the year's mean top-of-atmosphere imbalance N = F − λ·upper − (ε − 1)γ·(upper −
  ;; deep) of the mean states (Geoffroy et al. 2013b; N is linear in the state, so the mean of N
  ;; is N of the means) to imbalance[m]. Folds the min and max of the anomalies into the f64 pair at extremes + 16
  ;; and, with imbalance, of N into the pair at extremes + 32. If above is not 0, stores there
  ;; (as f64) how many anomalies exceed `lowest`. Members whose anomaly exceeds their
  ;; nextThreshold are listed, in member order, in the frame's crossed array from index lo;
  ;; returns how many there are (the caller records their crossings).
  (func (export "reportedStep")
      (param $frame i32) (param $lo i32) (param $n i32) (param $forcing i32) (param $anomaly i32)
      (param $imbalance i32) (param $extremes i32) (param $lowest f64) (param $above i32)
      (result i32)
    (local $first i32) (local $end i32) (local $i i32) (local $m i32) (local $crossings i32)
    (local $a11 i32) (local $a12 i32) (local $a21 i32) (local $a22 i32) (local $b1 i32) (local $b2 i32)
    (local $up i32) (local $dp i32) (local $bl i32) (local $next_threshold i32)
    (local $lambda i32) (local $uptake i32) (local $crossed i32)
    (local $m11 i32) (local $m12 i32) (local $m21 i32) (local $m22 i32) (local $r1 i32) (local $r2 i32)
    (local $mu v128) (local $md v128) (local $smu f64) (local $smd f64)
    (local $x v128) (local $y v128) (local $f v128) (local $next v128) (local $deep v128)
    (local $a v128) (local $t v128) (local $net v128) (local $low v128) (local $count v128)
    (local $amin v128) (local $amax v128) (local $nmin v128) (local $nmax v128)
    (local $sx f64) (local $sy f64) (local $sf f64) (local $snext f64) (local $sdeep f64) (local $sa f64)
    (local.set $first (i32.shl (local.get $lo) (i32.const 3)))
    (local.set $a11 (i32.add (i32.load offset=0 (local.get $frame)) (local.get $first)))
    (local.set $a12 (i32.add (i32.load offset=4 (local.get $frame)) (local.get $first)))
    (local.set $a21 (i32.add (i32.load offset=8 (local.get $frame)) (local.get $first)))
    (local.set $a22 (i32.add (i32.load offset=12 (local.get $frame)) (local.get $first)))
    (local.set $b1 (i32.add (i32.load offset=16 (local.get $frame)) (local.get $first)))
    (local.set $b2 (i32.add (i32.load offset=20 (local.get $frame)) (local.get $first)))
    (local.set $up (i32.add (i32.load offset=24 (local.get $frame)) (local.get $first)))
    (local.set $dp (i32.add (i32.load offset=28 (local.get $frame)) (local.get $first)))
    (local.set $bl (i32.add (i32.load offset=32 (local.get $frame)) (local.get $first)))
    (local.set $next_threshold (i32.add (i32.load offset=40 (local.get $frame)) (local.get $first)))
    (local.set $lambda (i32.add (i32.load offset=44 (local.get $frame)) (local.get $first)))
    (local.set $uptake (i32.add (i32.load offset=48 (local.get $frame)) (local.get $first)))
    (local.set $crossed (i32.add (i32.load offset=52 (local.get $frame)) (i32.shl (local.get $lo) (i32.const 2))))
    (local.set $m11 (i32.add (i32.load offset=56 (local.get $frame)) (local.get $first)))
    (local.set $m12 (i32.add (i32.load offset=60 (local.get $frame)) (local.get $first)))
    (local.set $m21 (i32.add (i32.load offset=64 (local.get $frame)) (local.get $first)))
    (local.set $m22 (i32.add (i32.load offset=68 (local.get $frame)) (local.get $first)))
    (local.set $r1 (i32.add (i32.load offset=72 (local.get $frame)) (local.get $first)))
    (local.set $r2 (i32.add (i32.load offset=76 (local.get $frame)) (local.get $first)))
    (local.set $forcing (i32.add (local.get $forcing) (local.get $first)))
    (local.set $anomaly (i32.add (local.get $anomaly) (local.get $first)))
    (if (local.get $imbalance) (then (local.set $imbalance (i32.add (local.get $imbalance) (local.get $first)))))
    (local.set $low (f64x2.splat (local.get $lowest)))
    (local.set $amin (f64x2.splat (f64.const inf)))
    (local.set $amax (f64x2.splat (f64.const -inf)))
    (local.set $nmin (f64x2.splat (f64.const inf)))
    (local.set $nmax (f64x2.splat (f64.const -inf)))
    (local.set $end (i32.and (i32.shl (local.get $n) (i32.const 3)) (i32.const -16)))
    (local.set $i (i32.const 0))
    (local.set $m (local.get $lo))
    (block $done
      (loop $pairs
        (br_if $done (i32.ge_u (local.get $i) (local.get $end)))
        (local.set $x (v128.load (i32.add (local.get $up) (local.get $i))))
        (local.set $y (v128.load (i32.add (local.get $dp) (local.get $i))))
        (local.set $f (v128.load (i32.add (local.get $forcing) (local.get $i))))
        (local.set $next
          (f64x2.add
            (f64x2.add
              (f64x2.mul (v128.load (i32.add (local.get $a11) (local.get $i))) (local.get $x))
              (f64x2.mul (v128.load (i32.add (local.get $a12) (local.get $i))) (local.get $y)))
            (f64x2.mul (v128.load (i32.add (local.get $b1) (local.get $i))) (local.get $f))))
        (local.set $deep
          (f64x2.add
            (f64x2.add
              (f64x2.mul (v128.load (i32.add (local.get $a21) (local.get $i))) (local.get $x))
              (f64x2.mul (v128.load (i32.add (local.get $a22) (local.get $i))) (local.get $y)))
            (f64x2.mul (v128.load (i32.add (local.get $b2) (local.get $i))) (local.get $f))))
        (v128.store (i32.add (local.get $up) (local.get $i)) (local.get $next))
        (v128.store (i32.add (local.get $dp) (local.get $i)) (local.get $deep))
        ;; The year's mean upper-layer temperature, from the state at the year's start.
        (local.set $mu
          (f64x2.add
            (f64x2.add
              (f64x2.mul (v128.load (i32.add (local.get $m11) (local.get $i))) (local.get $x))
              (f64x2.mul (v128.load (i32.add (local.get $m12) (local.get $i))) (local.get $y)))
            (f64x2.mul (v128.load (i32.add (local.get $r1) (local.get $i))) (local.get $f))))
        (local.set $a (f64x2.sub (local.get $mu) (v128.load (i32.add (local.get $bl) (local.get $i)))))
        (v128.store (i32.add (local.get $anomaly) (local.get $i)) (local.get $a))
        ;; A true lane of f64x2.gt is all ones, i.e. −1: subtracting it counts it.
        (local.set $count (i64x2.sub (local.get $count) (f64x2.gt (local.get $a) (local.get $low))))
        (local.set $amin (f64x2.pmin (local.get $amin) (local.get $a)))
        (local.set $amax (f64x2.pmax (local.get $amax) (local.get $a)))
        (local.set $t (v128.load (i32.add (local.get $next_threshold) (local.get $i))))
        (if (v128.any_true (f64x2.gt (local.get $a) (local.get $t)))
          (then
            (if (f64.gt (f64x2.extract_lane 0 (local.get $a)) (f64x2.extract_lane 0 (local.get $t)))
              (then
                (i32.store (i32.add (local.get $crossed) (i32.shl (local.get $crossings) (i32.const 2))) (local.get $m))
                (local.set $crossings (i32.add (local.get $crossings) (i32.const 1)))))
            (if (f64.gt (f64x2.extract_lane 1 (local.get $a)) (f64x2.extract_lane 1 (local.get $t)))
              (then
                (i32.store (i32.add (local.get $crossed) (i32.shl (local.get $crossings) (i32.const 2))) (i32.add (local.get $m) (i32.const 1)))
                (local.set $crossings (i32.add (local.get $crossings) (i32.const 1)))))))
        (if (local.get $imbalance)
          (then
            (local.set $md
              (f64x2.add
                (f64x2.add
                  (f64x2.mul (v128.load (i32.add (local.get $m21) (local.get $i))) (local.get $x))
                  (f64x2.mul (v128.load (i32.add (local.get $m22) (local.get $i))) (local.get $y)))
                (f64x2.mul (v128.load (i32.add (local.get $r2) (local.get $i))) (local.get $f))))
            (local.set $net
              (f64x2.sub
                (f64x2.sub (local.get $f) (f64x2.mul (v128.load (i32.add (local.get $lambda) (local.get $i))) (local.get $mu)))
                (f64x2.mul (v128.load (i32.add (local.get $uptake) (local.get $i))) (f64x2.sub (local.get $mu) (local.get $md)))))
            (v128.store (i32.add (local.get $imbalance) (local.get $i)) (local.get $net))
            (local.set $nmin (f64x2.pmin (local.get $nmin) (local.get $net)))
            (local.set $nmax (f64x2.pmax (local.get $nmax) (local.get $net)))))
        (local.set $i (i32.add (local.get $i) (i32.const 16)))
        (local.set $m (i32.add (local.get $m) (i32.const 2)))
        (br $pairs)))
    (if (i32.and (local.get $n) (i32.const 1))
      (then
        (local.set $sx (f64.load (i32.add (local.get $up) (local.get $i))))
        (local.set $sy (f64.load (i32.add (local.get $dp) (local.get $i))))
        (local.set $sf (f64.load (i32.add (local.get $forcing) (local.get $i))))
        (local.set $snext
          (f64.add
            (f64.add
              (f64.mul (f64.load (i32.add (local.get $a11) (local.get $i))) (local.get $sx))
              (f64.mul (f64.load (i32.add (local.get $a12) (local.get $i))) (local.get $sy)))
            (f64.mul (f64.load (i32.add (local.get $b1) (local.get $i))) (local.get $sf))))
        (local.set $sdeep
          (f64.add
            (f64.add
              (f64.mul (f64.load (i32.add (local.get $a21) (local.get $i))) (local.get $sx))
              (f64.mul (f64.load (i32.add (local.get $a22) (local.get $i))) (local.get $sy)))
            (f64.mul (f64.load (i32.add (local.get $b2) (local.get $i))) (local.get $sf))))
        (f64.store (i32.add (local.get $up) (local.get $i)) (local.get $snext))
        (f64.store (i32.add (local.get $dp) (local.get $i)) (local.get $sdeep))
        (local.set $smu
          (f64.add
            (f64.add
              (f64.mul (f64.load (i32.add (local.get $m11) (local.get $i))) (local.get $sx))
              (f64.mul (f64.load (i32.add (local.get $m12) (local.get $i))) (local.get $sy)))
            (f64.mul (f64.load (i32.add (local.get $r1) (local.get $i))) (local.get $sf))))
        (local.set $sa (f64.sub (local.get $smu) (f64.load (i32.add (local.get $bl) (local.get $i)))))
        (f64.store (i32.add (local.get $anomaly) (local.get $i)) (local.get $sa))
        ;; Into lane 0 only: lane 1 keeps its count and extremes.
        (if (f64.gt (local.get $sa) (local.get $lowest))
          (then (local.set $count (i64x2.add (local.get $count) (v128.const i64x2 1 0)))))
        (local.set $amin (f64x2.replace_lane 0 (local.get $amin)
          (select (local.get $sa) (f64x2.extract_lane 0 (local.get $amin)) (f64.lt (local.get $sa) (f64x2.extract_lane 0 (local.get $amin))))))
        (local.set $amax (f64x2.replace_lane 0 (local.get $amax)
          (select (local.get $sa) (f64x2.extract_lane 0 (local.get $amax)) (f64.gt (local.get $sa) (f64x2.extract_lane 0 (local.get $amax))))))
        (if (f64.gt (local.get $sa) (f64.load (i32.add (local.get $next_threshold) (local.get $i))))
          (then
            (i32.store (i32.add (local.get $crossed) (i32.shl (local.get $crossings) (i32.const 2))) (local.get $m))
            (local.set $crossings (i32.add (local.get $crossings) (i32.const 1)))))
        (if (local.get $imbalance)
          (then
            (local.set $smd
              (f64.add
                (f64.add
                  (f64.mul (f64.load (i32.add (local.get $m21) (local.get $i))) (local.get $sx))
                  (f64.mul (f64.load (i32.add (local.get $m22) (local.get $i))) (local.get $sy)))
                (f64.mul (f64.load (i32.add (local.get $r2) (local.get $i))) (local.get $sf))))
            (local.set $sf
              (f64.sub
                (f64.sub (local.get $sf) (f64.mul (f64.load (i32.add (local.get $lambda) (local.get $i))) (local.get $smu)))
                (f64.mul (f64.load (i32.add (local.get $uptake) (local.get $i))) (f64.sub (local.get $smu) (local.get $smd)))))
            (f64.store (i32.add (local.get $imbalance) (local.get $i)) (local.get $sf))
            (local.set $nmin (f64x2.replace_lane 0 (local.get $nmin)
              (select (local.get $sf) (f64x2.extract_lane 0 (local.get $nmin)) (f64.lt (local.get $sf) (f64x2.extract_lane 0 (local.get $nmin))))))
            (local.set $nmax (f64x2.replace_lane 0 (local.get $nmax)
              (select (local.get $sf) (f64x2.extract_lane 0 (local.get $nmax)) (f64.gt (local.get $sf) (f64x2.extract_lane 0 (local.get $nmax))))))))))
    (call $fold (i32.add (local.get $extremes) (i32.const 16)) (local.get $amin) (local.get $amax))
    (if (local.get $imbalance)
      (then (call $fold (i32.add (local.get $extremes) (i32.const 32)) (local.get $nmin) (local.get $nmax))))
    (if (local.get $above)
      (then
        (f64.store (local.get $above)
          (f64.convert_i64_u (i64.add (i64x2.extract_lane 0 (local.get $count)) (i64x2.extract_lane 1 (local.get $count)))))))
    (local.get $crossings))
)
