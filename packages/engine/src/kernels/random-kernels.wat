;; Baagøe's Alea generator (seedrandom 3.0.5, lib/alea.js) stepping straight into a kernel
;; memory column: the loops of random/alea-stream.ts's fill and fillTwo, which say what Alea
;; is and why two streams are interleaved. Compiled by scripts/build-kernels.mjs (wabt) into
;; random-kernels-wasm.ts; a test checks the committed bytes are this file's, and another
;; that the draws are seedrandom's, bit for bit.
;;
;; Why here and not in TypeScript: in a fresh process the TypeScript loop runs in V8's
;; unoptimised tiers first, where every double it computes is boxed on the heap (measured:
;; 47 MB of garbage for W1's 1.4 million draws at 100,000 members); WebAssembly's first
;; compiler keeps them in registers from the first call.
;;
;; Same numbers: every step is the library's expression in its order, in IEEE 754 double
;; arithmetic (WebAssembly has no fused multiply-add). JavaScript's `t | 0` is ToInt32,
;; which for t in [0, 2^31) is truncation: Alea's t lies in [0, 2091640) and s·2^21 in
;; [0, 2^21), so i32.trunc_sat_f64_s gives the same integer.
;;
;; A state is four f64 (c, s0, s1, s2); each function takes the states as parameters and
;; returns them as results (multi-value), so no memory but the output columns is touched.
;; A draw of exactly 0 (probability 2^-53) is redrawn, as seedrandom's double() users here
;; expect (AleaStream.next).

(module
  (import "env" "memory" (memory 1 65536 shared))

  ;; One draw from state (c, s0, s1, s2): two multiply-with-carry steps, hi + lo·2^-53,
  ;; repeated while the draw is 0. Returns (draw, c, s0, s1, s2).
  (func $draw (param $c f64) (param $s0 f64) (param $s1 f64) (param $s2 f64)
      (result f64 f64 f64 f64 f64)
    (local $t f64) (local $hi f64) (local $u f64)
    (loop $again
      (local.set $t (f64.add (f64.mul (f64.const 2091639) (local.get $s0)) (f64.mul (local.get $c) (f64.const 0x1p-32))))
      (local.set $s0 (local.get $s1))
      (local.set $s1 (local.get $s2))
      (local.set $c (f64.convert_i32_s (i32.trunc_sat_f64_s (local.get $t))))
      (local.set $s2 (f64.sub (local.get $t) (local.get $c)))
      (local.set $hi (local.get $s2))
      (local.set $t (f64.add (f64.mul (f64.const 2091639) (local.get $s0)) (f64.mul (local.get $c) (f64.const 0x1p-32))))
      (local.set $s0 (local.get $s1))
      (local.set $s1 (local.get $s2))
      (local.set $c (f64.convert_i32_s (i32.trunc_sat_f64_s (local.get $t))))
      (local.set $s2 (f64.sub (local.get $t) (local.get $c)))
      (local.set $u (f64.add (local.get $hi)
        (f64.mul (f64.convert_i32_s (i32.trunc_sat_f64_s (f64.mul (local.get $s2) (f64.const 2097152)))) (f64.const 0x1p-53))))
      (br_if $again (f64.le (local.get $u) (f64.const 0))))
    (local.get $u) (local.get $c) (local.get $s0) (local.get $s1) (local.get $s2))

  ;; fill: out[0 … n) ← n draws of one stream (out: a byte address). Returns the state.
  (func (export "fill") (param $out i32) (param $n i32)
      (param $c f64) (param $s0 f64) (param $s1 f64) (param $s2 f64)
      (result f64 f64 f64 f64)
    (local $end i32) (local $u f64)
    (local.set $end (i32.add (local.get $out) (i32.shl (local.get $n) (i32.const 3))))
    (block $done
      (loop $each
        (br_if $done (i32.ge_u (local.get $out) (local.get $end)))
        (call $draw (local.get $c) (local.get $s0) (local.get $s1) (local.get $s2))
        (local.set $s2) (local.set $s1) (local.set $s0) (local.set $c) (local.set $u)
        (f64.store (local.get $out) (local.get $u))
        (local.set $out (i32.add (local.get $out) (i32.const 8)))
        (br $each)))
    (local.get $c) (local.get $s0) (local.get $s1) (local.get $s2))

  ;; fillTwo: outA[0 … n) and outB[0 … n) ← n draws of stream A and of stream B, the two
  ;; streams' steps interleaved (each waits on its own carry, so the core runs both at
  ;; once). Returns A's state, then B's.
  (func (export "fillTwo") (param $outA i32) (param $outB i32) (param $n i32)
      (param $c f64) (param $s0 f64) (param $s1 f64) (param $s2 f64)
      (param $d f64) (param $r0 f64) (param $r1 f64) (param $r2 f64)
      (result f64 f64 f64 f64 f64 f64 f64 f64)
    (local $i i32) (local $end i32)
    (local $t f64) (local $q f64) (local $hiA f64) (local $hiB f64) (local $u f64) (local $v f64)
    (local.set $end (i32.shl (local.get $n) (i32.const 3)))
    (block $done
      (loop $each
        (br_if $done (i32.ge_u (local.get $i) (local.get $end)))
        (local.set $t (f64.add (f64.mul (f64.const 2091639) (local.get $s0)) (f64.mul (local.get $c) (f64.const 0x1p-32))))
        (local.set $s0 (local.get $s1))
        (local.set $s1 (local.get $s2))
        (local.set $c (f64.convert_i32_s (i32.trunc_sat_f64_s (local.get $t))))
        (local.set $s2 (f64.sub (local.get $t) (local.get $c)))
        (local.set $hiA (local.get $s2))
        (local.set $q (f64.add (f64.mul (f64.const 2091639) (local.get $r0)) (f64.mul (local.get $d) (f64.const 0x1p-32))))
        (local.set $r0 (local.get $r1))
        (local.set $r1 (local.get $r2))
        (local.set $d (f64.convert_i32_s (i32.trunc_sat_f64_s (local.get $q))))
        (local.set $r2 (f64.sub (local.get $q) (local.get $d)))
        (local.set $hiB (local.get $r2))
        (local.set $t (f64.add (f64.mul (f64.const 2091639) (local.get $s0)) (f64.mul (local.get $c) (f64.const 0x1p-32))))
        (local.set $s0 (local.get $s1))
        (local.set $s1 (local.get $s2))
        (local.set $c (f64.convert_i32_s (i32.trunc_sat_f64_s (local.get $t))))
        (local.set $s2 (f64.sub (local.get $t) (local.get $c)))
        (local.set $q (f64.add (f64.mul (f64.const 2091639) (local.get $r0)) (f64.mul (local.get $d) (f64.const 0x1p-32))))
        (local.set $r0 (local.get $r1))
        (local.set $r1 (local.get $r2))
        (local.set $d (f64.convert_i32_s (i32.trunc_sat_f64_s (local.get $q))))
        (local.set $r2 (f64.sub (local.get $q) (local.get $d)))
        (local.set $u (f64.add (local.get $hiA)
          (f64.mul (f64.convert_i32_s (i32.trunc_sat_f64_s (f64.mul (local.get $s2) (f64.const 2097152)))) (f64.const 0x1p-53))))
        (local.set $v (f64.add (local.get $hiB)
          (f64.mul (f64.convert_i32_s (i32.trunc_sat_f64_s (f64.mul (local.get $r2) (f64.const 2097152)))) (f64.const 0x1p-53))))
        ;; A draw of exactly 0: that stream draws again from where it is.
        (if (f64.le (local.get $u) (f64.const 0))
          (then
            (call $draw (local.get $c) (local.get $s0) (local.get $s1) (local.get $s2))
            (local.set $s2) (local.set $s1) (local.set $s0) (local.set $c) (local.set $u)))
        (if (f64.le (local.get $v) (f64.const 0))
          (then
            (call $draw (local.get $d) (local.get $r0) (local.get $r1) (local.get $r2))
            (local.set $r2) (local.set $r1) (local.set $r0) (local.set $d) (local.set $v)))
        (f64.store (i32.add (local.get $outA) (local.get $i)) (local.get $u))
        (f64.store (i32.add (local.get $outB) (local.get $i)) (local.get $v))
        (local.set $i (i32.add (local.get $i) (i32.const 8)))
        (br $each)))
    (local.get $c) (local.get $s0) (local.get $s1) (local.get $s2)
    (local.get $d) (local.get $r0) (local.get $r1) (local.get $r2))
)
