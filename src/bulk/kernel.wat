;; hotjunction bulk kernels: the ITS-90 reference function E(t) and the exact inverse's interpolants over arrays,
;; two float64 lanes at a time (WebAssembly SIMD, f64x2). Hand-written; assembled by scripts/buildWasm.ts (wabt)
;; into src/bulk/_kernelWasm.ts. WebAssembly has no fused multiply-add outside the relaxed-SIMD proposal (not
;; used here), and every operation below is the IEEE 754 operation the JavaScript path performs, in the same order,
;; so each result is the same float64 as the scalar JavaScript path's (tests/bulk hold it so).
;;
;; Memory is laid out by src/bulk/wasmKernel.ts: a forward table of sub-ranges, a chunk of elements converted in
;; place, and the exact-inverse mirrors of the types used. Nothing here allocates.
(module
  (memory (export "memory") 2)

  ;; Set when an element needs the JavaScript path (an exponential-term argument outside |x| < 704, where the
  ;; exponential's scaling would need its subnormal or overflow branches).
  (global $bail (mut i32) (i32.const 0))

  ;; The constants of $exp2 at 3072 (one v128 each), stored once at instantiation: a load is cheaper than
  ;; building a constant in a register at every call.
  (func $init
    (v128.store offset=3072 (i32.const 0) (v128.const f64x2 704 704))
    (v128.store offset=3088 (i32.const 0) (v128.const f64x2 0 0))
    (v128.store offset=3104 (i32.const 0) (v128.const i64x2 0x3fd62e4300000000 0x3fd62e4300000000))
    (v128.store offset=3120 (i32.const 0) (v128.const i64x2 0x8000000000000000 0x8000000000000000))
    (v128.store offset=3136 (i32.const 0) (v128.const f64x2 1 1))
    (v128.store offset=3152 (i32.const 0) (v128.const f64x2 1.44269504088896338700e+00 1.44269504088896338700e+00))
    (v128.store offset=3168 (i32.const 0) (v128.const f64x2 0.5 0.5))
    (v128.store offset=3184 (i32.const 0) (v128.const i64x2 0x3ff0a2b200000000 0x3ff0a2b200000000))
    (v128.store offset=3200 (i32.const 0) (v128.const f64x2 6.93147180369123816490e-01 6.93147180369123816490e-01))
    (v128.store offset=3216 (i32.const 0) (v128.const f64x2 1.90821492927058770002e-10 1.90821492927058770002e-10))
    (v128.store offset=3232 (i32.const 0) (v128.const f64x2 1.66666666666666019037e-01 1.66666666666666019037e-01))
    (v128.store offset=3248 (i32.const 0) (v128.const f64x2 -2.77777777770155933842e-03 -2.77777777770155933842e-03))
    (v128.store offset=3264 (i32.const 0) (v128.const f64x2 6.61375632143793436117e-05 6.61375632143793436117e-05))
    (v128.store offset=3280 (i32.const 0) (v128.const f64x2 -1.65339022054652515390e-06 -1.65339022054652515390e-06))
    (v128.store offset=3296 (i32.const 0) (v128.const f64x2 4.13813679705723846039e-08 4.13813679705723846039e-08))
    (v128.store offset=3312 (i32.const 0) (v128.const f64x2 2 2))
    (v128.store offset=3328 (i32.const 0) (v128.const f64x2 6755399441055744 6755399441055744))
    (v128.store offset=3344 (i32.const 0) (v128.const i64x2 1023 1023))
    (v128.store offset=3360 (i32.const 0) (v128.const i64x2 0x3e30000000000000 0x3e30000000000000))
    (v128.store offset=3376 (i32.const 0) (v128.const f64x2 2.718281828459045 2.718281828459045))
    (v128.store offset=3392 (i32.const 0) (v128.const f64x2 80 80)))
  (start $init)

  ;; e^x per lane, on two vectors at once (four lanes; the two dependency chains interleaved so that they
  ;; overlap): the fdlibm algorithm (Sun Microsystems' freely distributable libm, e_exp.c) as V8 carries it
  ;; for Math.exp, including its exp(1) = Math.E special case: argument reduction x = k*ln2 + r with ln2 split in a
  ;; high and a low part, a degree-5 rational approximation of r, then scaling by 2^k. The branches of the scalar
  ;; code become lane selects; for |x| < 704 they give the scalar code's result bit for bit (k = 0 and k = +-1 are
  ;; the general formula with exact products, see DEVELOPERS.md). Lanes with |x| >= 704 set $bail.
  (func $exp2 (param $x0 v128) (param $x1 v128) (result v128 v128)
    (local $abs0 v128) (local $neg0 v128) (local $k0 v128) (local $hi0 v128) (local $lo0 v128) (local $r0 v128)
    (local $t0 v128) (local $c0 v128) (local $y0 v128)
    (local $abs1 v128) (local $neg1 v128) (local $k1 v128) (local $hi1 v128) (local $lo1 v128) (local $r1 v128)
    (local $t1 v128) (local $c1 v128) (local $y1 v128)
    (local.set $abs0 (f64x2.abs (local.get $x0)))
    (local.set $abs1 (f64x2.abs (local.get $x1)))
    (if (i32.eqz (i64x2.all_true (f64x2.lt (local.get $abs0) (v128.load offset=3072 (i32.const 0)))))
      (then (global.set $bail (i32.const 1))))
    (if (i32.eqz (i64x2.all_true (f64x2.lt (local.get $abs1) (v128.load offset=3072 (i32.const 0)))))
      (then (global.set $bail (i32.const 1))))
    (local.set $neg0 (f64x2.lt (local.get $x0) (v128.load offset=3088 (i32.const 0))))
    (local.set $neg1 (f64x2.lt (local.get $x1) (v128.load offset=3088 (i32.const 0))))
    ;; k: 0 when |x| <= 0.5 ln2 (high word <= 0x3fd62e42, i.e. |x| < 0x3fd62e4300000000); +-1 when |x| < 1.5 ln2
    ;; (high word < 0x3ff0a2b2); else trunc(x/ln2 +- 0.5).
    (local.set $k0
      (v128.and
        (f64x2.ge (local.get $abs0) (v128.load offset=3104 (i32.const 0)))
        (v128.bitselect
          (v128.or (v128.and (local.get $neg0) (v128.load offset=3120 (i32.const 0)))
            (v128.load offset=3136 (i32.const 0)))
          (f64x2.trunc
            (f64x2.add
              (f64x2.mul (v128.load offset=3152 (i32.const 0)) (local.get $x0))
              (v128.or (v128.and (local.get $neg0) (v128.load offset=3120 (i32.const 0)))
                (v128.load offset=3168 (i32.const 0)))))
          (f64x2.lt (local.get $abs0) (v128.load offset=3184 (i32.const 0))))))
    (local.set $k1
      (v128.and
        (f64x2.ge (local.get $abs1) (v128.load offset=3104 (i32.const 0)))
        (v128.bitselect
          (v128.or (v128.and (local.get $neg1) (v128.load offset=3120 (i32.const 0)))
            (v128.load offset=3136 (i32.const 0)))
          (f64x2.trunc
            (f64x2.add
              (f64x2.mul (v128.load offset=3152 (i32.const 0)) (local.get $x1))
              (v128.or (v128.and (local.get $neg1) (v128.load offset=3120 (i32.const 0)))
                (v128.load offset=3168 (i32.const 0)))))
          (f64x2.lt (local.get $abs1) (v128.load offset=3184 (i32.const 0))))))
    (local.set $hi0
      (f64x2.sub (local.get $x0)
        (f64x2.mul (local.get $k0) (v128.load offset=3200 (i32.const 0)))))
    (local.set $hi1
      (f64x2.sub (local.get $x1)
        (f64x2.mul (local.get $k1) (v128.load offset=3200 (i32.const 0)))))
    (local.set $lo0 (f64x2.mul (local.get $k0) (v128.load offset=3216 (i32.const 0))))
    (local.set $lo1 (f64x2.mul (local.get $k1) (v128.load offset=3216 (i32.const 0))))
    (local.set $r0 (f64x2.sub (local.get $hi0) (local.get $lo0)))
    (local.set $r1 (f64x2.sub (local.get $hi1) (local.get $lo1)))
    (local.set $t0 (f64x2.mul (local.get $r0) (local.get $r0)))
    (local.set $t1 (f64x2.mul (local.get $r1) (local.get $r1)))
    ;; c = r - t*(P1 + t*(P2 + t*(P3 + t*(P4 + t*P5))))
    (local.set $c0
      (f64x2.sub (local.get $r0)
        (f64x2.mul (local.get $t0)
          (f64x2.add (v128.load offset=3232 (i32.const 0))
            (f64x2.mul (local.get $t0)
              (f64x2.add (v128.load offset=3248 (i32.const 0))
                (f64x2.mul (local.get $t0)
                  (f64x2.add (v128.load offset=3264 (i32.const 0))
                    (f64x2.mul (local.get $t0)
                      (f64x2.add (v128.load offset=3280 (i32.const 0))
                        (f64x2.mul (local.get $t0)
                          (v128.load offset=3296 (i32.const 0)))))))))))))
    (local.set $c1
      (f64x2.sub (local.get $r1)
        (f64x2.mul (local.get $t1)
          (f64x2.add (v128.load offset=3232 (i32.const 0))
            (f64x2.mul (local.get $t1)
              (f64x2.add (v128.load offset=3248 (i32.const 0))
                (f64x2.mul (local.get $t1)
                  (f64x2.add (v128.load offset=3264 (i32.const 0))
                    (f64x2.mul (local.get $t1)
                      (f64x2.add (v128.load offset=3280 (i32.const 0))
                        (f64x2.mul (local.get $t1)
                          (v128.load offset=3296 (i32.const 0)))))))))))))
    ;; y = 1 - ((lo - r*c/(2 - c)) - hi); for k = 0 (hi = r, lo = 0) the same float as 1 - (r*c/(c - 2) - r).
    (local.set $y0
      (f64x2.sub (v128.load offset=3136 (i32.const 0))
        (f64x2.sub
          (f64x2.sub (local.get $lo0)
            (f64x2.div (f64x2.mul (local.get $r0) (local.get $c0))
              (f64x2.sub (v128.load offset=3312 (i32.const 0)) (local.get $c0))))
          (local.get $hi0))))
    (local.set $y1
      (f64x2.sub (v128.load offset=3136 (i32.const 0))
        (f64x2.sub
          (f64x2.sub (local.get $lo1)
            (f64x2.div (f64x2.mul (local.get $r1) (local.get $c1))
              (f64x2.sub (v128.load offset=3312 (i32.const 0)) (local.get $c1))))
          (local.get $hi1))))
    ;; times 2^k, built from its bits: k + 1.5*2^52 holds k in its low bits, so ((bits + 1023) << 52) is 2^k
    ;; (k is within +-1016 here), the scaling V8 does.
    (local.set $y0
      (f64x2.mul (local.get $y0)
        (i64x2.shl
          (i64x2.add (f64x2.add (local.get $k0) (v128.load offset=3328 (i32.const 0)))
            (v128.load offset=3344 (i32.const 0)))
          (i32.const 52))))
    (local.set $y1
      (f64x2.mul (local.get $y1)
        (i64x2.shl
          (i64x2.add (f64x2.add (local.get $k1) (v128.load offset=3328 (i32.const 0)))
            (v128.load offset=3344 (i32.const 0)))
          (i32.const 52))))
    ;; |x| < 2^-28 (high word < 0x3e300000): 1 + x.
    (local.set $y0
      (v128.bitselect (f64x2.add (v128.load offset=3136 (i32.const 0)) (local.get $x0)) (local.get $y0)
        (f64x2.lt (local.get $abs0) (v128.load offset=3360 (i32.const 0)))))
    (local.set $y1
      (v128.bitselect (f64x2.add (v128.load offset=3136 (i32.const 0)) (local.get $x1)) (local.get $y1)
        (f64x2.lt (local.get $abs1) (v128.load offset=3360 (i32.const 0)))))
    ;; exp(1) is Math.E.
    (local.set $y0 (v128.bitselect (v128.load offset=3376 (i32.const 0)) (local.get $y0)
      (f64x2.eq (local.get $x0) (v128.load offset=3136 (i32.const 0)))))
    (local.set $y1 (v128.bitselect (v128.load offset=3376 (i32.const 0)) (local.get $y1)
      (f64x2.eq (local.get $x1) (v128.load offset=3136 (i32.const 0)))))
    (local.get $y0) (local.get $y1))

  ;; $exp2 on one vector (the second result dropped): the single elements of the forward kernel.
  (func $exp (param $x v128) (result v128)
    (call $exp2 (local.get $x) (local.get $x))
    (drop))

  ;; One lane of $exp, for the check at instantiation against the engine's Math.exp (src/bulk/wasmKernel.ts).
  (func (export "exp") (param $x f64) (result f64)
    (f64x2.extract_lane 0 (call $exp (f64x2.splat (local.get $x)))))

  ;; sum c_i*t^i per lane by Horner from the highest coefficient: $p points to c[n-1], c[n-2], ..., c[0] (descending).
  (func $horner (param $t v128) (param $p i32) (param $n i32) (result v128)
    (local $acc v128)
    (local.set $acc (v128.load64_splat (local.get $p)))
    (block $done
      (loop $next
        (local.set $n (i32.sub (local.get $n) (i32.const 1)))
        (br_if $done (i32.le_s (local.get $n) (i32.const 0)))
        (local.set $p (i32.add (local.get $p) (i32.const 8)))
        (local.set $acc (f64x2.add (f64x2.mul (local.get $acc) (local.get $t)) (v128.load64_splat (local.get $p))))
        (br $next)))
    (local.get $acc))

  ;; acc + a0*exp(a1*d*d), d = t - a2 (type K's exponential term; the sum in this order, as the JavaScript path).
  (func $withExp (param $acc v128) (param $t v128) (param $a0 v128) (param $a1 v128) (param $a2 v128) (result v128)
    (local $d v128)
    (local.set $d (f64x2.sub (local.get $t) (local.get $a2)))
    (f64x2.add (local.get $acc)
      (f64x2.mul (local.get $a0) (call $exp (f64x2.mul (f64x2.mul (local.get $a1) (local.get $d)) (local.get $d))))))

  ;; $withExp on two vectors at once.
  (func $withExp2 (param $acc0 v128) (param $acc1 v128) (param $t0 v128) (param $t1 v128) (param $a0 v128)
      (param $a1 v128) (param $a2 v128) (result v128 v128)
    (local $d0 v128) (local $d1 v128) (local $e0 v128) (local $e1 v128)
    (local.set $d0 (f64x2.sub (local.get $t0) (local.get $a2)))
    (local.set $d1 (f64x2.sub (local.get $t1) (local.get $a2)))
    (call $exp2 (f64x2.mul (f64x2.mul (local.get $a1) (local.get $d0)) (local.get $d0))
      (f64x2.mul (f64x2.mul (local.get $a1) (local.get $d1)) (local.get $d1)))
    (local.set $e1)
    (local.set $e0)
    (f64x2.add (local.get $acc0) (f64x2.mul (local.get $a0) (local.get $e0)))
    (f64x2.add (local.get $acc1) (f64x2.mul (local.get $a0) (local.get $e1))))

  ;; Lanes of $v inside [lo, hi) and <= maxC: all true.
  (func $inSub (param $v v128) (param $lo v128) (param $hi v128) (param $max v128) (result i32)
    (i64x2.all_true
      (v128.and (v128.and (f64x2.ge (local.get $v) (local.get $lo)) (f64x2.lt (local.get $v) (local.get $hi)))
        (f64x2.le (local.get $v) (local.get $max)))))

  ;; E(t) in place over n float64 at $ptr. The forward table at $tab holds $nsub sub-ranges of 160 bytes each:
  ;; lo (f64; the type's minC for the first), hi (f64; +Infinity for the last), coefficient count (i32), exponential
  ;; flag (i32), then 16 coefficient slots holding the coefficients from the highest down, right-aligned (the last
  ;; slot is c0). Returns n when every element is converted, else the
  ;; index of the first element it left for the JavaScript path (outside [minC, maxC] or NaN, or an exponential
  ;; argument outside its range); elements before it are converted.
  (func (export "forward") (param $ptr i32) (param $n i32) (param $tab i32) (param $nsub i32)
      (param $minC f64) (param $maxC f64) (param $a0s f64) (param $a1s f64) (param $a2s f64) (result i32)
    (local $i i32) (local $s i32) (local $sp i32) (local $nc i32) (local $cp i32) (local $exp i32) (local $at i32)
    (local $t f64) (local $lo v128) (local $hi v128) (local $max v128) (local $a0 v128) (local $a1 v128)
    (local $a2 v128) (local $v0 v128) (local $v1 v128) (local $r0 v128) (local $r1 v128) (local $c v128) (local $k i32)
    (local.set $max (f64x2.splat (local.get $maxC)))
    (local.set $a0 (f64x2.splat (local.get $a0s)))
    (local.set $a1 (f64x2.splat (local.get $a1s)))
    (local.set $a2 (f64x2.splat (local.get $a2s)))
    (global.set $bail (i32.const 0))
    (block $finished
      (loop $select
        (br_if $finished (i32.ge_u (local.get $i) (local.get $n)))
        (local.set $t (f64.load (i32.add (local.get $ptr) (i32.shl (local.get $i) (i32.const 3)))))
        (if (i32.eqz (i32.and (f64.ge (local.get $t) (local.get $minC)) (f64.le (local.get $t) (local.get $maxC))))
          (then (return (local.get $i))))
        ;; The highest sub-range whose lower end is <= t (a shared end point belongs to the upper sub-range).
        (local.set $s (i32.sub (local.get $nsub) (i32.const 1)))
        (block $found
          (loop $down
            (br_if $found (i32.le_s (local.get $s) (i32.const 0)))
            (br_if $found (f64.ge (local.get $t) (f64.load (i32.add (local.get $tab) (i32.mul (local.get $s) (i32.const 160))))))
            (local.set $s (i32.sub (local.get $s) (i32.const 1)))
            (br $down)))
        (local.set $sp (i32.add (local.get $tab) (i32.mul (local.get $s) (i32.const 160))))
        (local.set $lo (v128.load64_splat (local.get $sp)))
        (local.set $hi (v128.load64_splat (i32.add (local.get $sp) (i32.const 8))))
        (local.set $nc (i32.load (i32.add (local.get $sp) (i32.const 16))))
        (local.set $exp (i32.load (i32.add (local.get $sp) (i32.const 20))))
        (local.set $cp (i32.add (local.get $sp) (i32.const 24)))
        ;; A run of elements in this sub-range: four at a time while all four belong to it, else one.
        (loop $run
          (local.set $at (i32.add (local.get $ptr) (i32.shl (local.get $i) (i32.const 3))))
          (block $single
            (br_if $single (i32.gt_u (i32.add (local.get $i) (i32.const 4)) (local.get $n)))
            (local.set $v0 (v128.load (local.get $at)))
            (local.set $v1 (v128.load offset=16 (local.get $at)))
            ;; All four in [lo, hi) and <= maxC.
            (br_if $single (i32.eqz (i64x2.all_true
              (v128.and
                (v128.and
                  (v128.and (f64x2.ge (local.get $v0) (local.get $lo)) (f64x2.lt (local.get $v0) (local.get $hi)))
                  (v128.and (f64x2.ge (local.get $v1) (local.get $lo)) (f64x2.lt (local.get $v1) (local.get $hi))))
                (v128.and (f64x2.le (local.get $v0) (local.get $max)) (f64x2.le (local.get $v1) (local.get $max)))))))
            ;; Two Horner chains side by side (independent, so their latencies overlap).
            ;; Two Horner chains side by side (independent, so their latencies overlap), unrolled: the coefficients
            ;; sit right-aligned in 16 slots (c[n-1] in slot 16 - n), and the jump enters the run of steps at the
            ;; first one that has a coefficient.
            (local.set $r0 (v128.load64_splat (i32.add (local.get $cp) (i32.shl (i32.sub (i32.const 16) (local.get $nc)) (i32.const 3)))))
            (local.set $r1 (local.get $r0))
            (block $h15 (block $h14 (block $h13 (block $h12 (block $h11 (block $h10 (block $h9 (block $h8 (block $h7 (block $h6 (block $h5 (block $h4 (block $h3 (block $h2 (block $h1 (block $h0 
              (br_table $h0 $h1 $h2 $h3 $h4 $h5 $h6 $h7 $h8 $h9 $h10 $h11 $h12 $h13 $h14 $h15 (i32.sub (i32.const 16) (local.get $nc))))
            (local.set $c (v128.load64_splat offset=8 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=16 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=24 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=32 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=40 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=48 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=56 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=64 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=72 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=80 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=88 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=96 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=104 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=112 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (local.set $c (v128.load64_splat offset=120 (local.get $cp)))
            (local.set $r0 (f64x2.add (f64x2.mul (local.get $r0) (local.get $v0)) (local.get $c)))
            (local.set $r1 (f64x2.add (f64x2.mul (local.get $r1) (local.get $v1)) (local.get $c)))
            )
            (if (local.get $exp)
              (then
                (call $withExp2 (local.get $r0) (local.get $r1) (local.get $v0) (local.get $v1) (local.get $a0)
                  (local.get $a1) (local.get $a2))
                (local.set $r1)
                (local.set $r0)
                (if (global.get $bail) (then (global.set $bail (i32.const 0)) (br $single)))))
            (v128.store (local.get $at) (local.get $r0))
            (v128.store offset=16 (local.get $at) (local.get $r1))
            (local.set $i (i32.add (local.get $i) (i32.const 4)))
            (br $run))
          ;; One element (a run's ragged end, or a block of four that leaves the sub-range).
          (br_if $finished (i32.ge_u (local.get $i) (local.get $n)))
          (local.set $v0 (v128.load64_splat (local.get $at)))
          (br_if $select (i32.eqz (call $inSub (local.get $v0) (local.get $lo) (local.get $hi) (local.get $max))))
          (local.set $r0 (call $horner (local.get $v0)
            (i32.add (local.get $cp) (i32.shl (i32.sub (i32.const 16) (local.get $nc)) (i32.const 3))) (local.get $nc)))
          (if (local.get $exp)
            (then
              (local.set $r0 (call $withExp (local.get $r0) (local.get $v0) (local.get $a0) (local.get $a1) (local.get $a2)))
              (if (global.get $bail) (then (return (local.get $i))))))
          (v128.store64_lane 0 (local.get $at) (local.get $r0))
          (local.set $i (i32.add (local.get $i) (i32.const 1)))
          (br $run))))
    (local.get $n))

  ;; The float after x (x finite).
  (func $nextUp (param $x f64) (result f64)
    (if (result f64) (f64.eq (local.get $x) (f64.const 0))
      (then (f64.const 0x1p-1074))
      (else (f64.reinterpret_i64 (i64.add (i64.reinterpret_f64 (local.get $x))
        (select (i64.const 1) (i64.const -1) (f64.gt (local.get $x) (f64.const 0))))))))

  ;; The exact inverse's interpolated segments, in place over n float64 (EMFs in, temperatures out) at $ptr. The
  ;; table at $tab holds $np pieces of 48 bytes, all f64: EMF start, segments per millivolt, the last segment's
  ;; index (count - 1), 1.5*2^52 plus the address of the piece's segment records (the address sits in the float's
  ;; low 32 bits, and base + 80k is exact), then the piece's EMF interval [L, U): L the largest start of the pieces
  ;; up to this one (-Infinity for the first), U the next piece's L (+Infinity for the last). JavaScript scans the
  ;; pieces in order and stops at the first whose start is above e, so e falls in piece J exactly when L <= e < U.
  ;; A record is 80 bytes: the 8 coefficients, c0 first, then the segment's two edge temperatures; a lower edge NaN
  ;; marks a segment not mirrored here. Returns n when every element is converted, else the index of the first
  ;; element it left for the JavaScript path: outside (lowOk, highOk], or a segment not mirrored (not built yet, or
  ;; solved by Newton); elements before it are converted, elements from it on are left as they were. Each step is
  ;; the JavaScript exact inverse's, in its order: the piece, x = (e - start) * perMillivolt, k = floor(x) clamped
  ;; to the piece's segments, s = 2(x - k) - 1, Horner over the segment's 8 coefficients in s from c7, and the
  ;; clamp to the segment's edges, t < lo ? lo : t > hi ? hi : t.
  ;;
  ;; Fast path, blocks of up to 256 elements in pairs (two lanes), in two passes so that each loop body is short and
  ;; the processor overlaps the dependency chains of successive pairs (one pair's 7 multiply-add steps are
  ;; latency-bound). Pass 1 locates the pairs: while the next two pairs lie in the piece of the block's first
  ;; element (within the window: e > lowOk is e >= the float after lowOk), both at once with that piece's numbers
  ;; from registers; else one pair, each lane selecting its piece by compares and selects. floor, then max(., 0) and
  ;; min(., last) as pmax/pmin, which for these operands give Math.max/Math.min's floats (+0 for -0 included). It
  ;; writes s and the two record addresses per pair to a scratch area at 36864 (4 KiB). Pass 2 evaluates: four
  ;; pairs whose eight lanes share one segment as four chains side by side, each coefficient loaded once for all;
  ;; else one pair, each lane's coefficients gathered (a 16-byte load per two coefficients, lanes paired by
  ;; shuffles). The clamp is pmax(pmin(t, hi), lo), which is JavaScript's t < lo ? lo : t > hi ? hi : t whenever
  ;; lo <= hi; a pair with !(lo <= hi) in a lane (NaN lower edge: segment not mirrored) is not stored. A pass stops
  ;; at the first pair it cannot do; then the slow path below takes the element at i alone (scalar, the clamp by
  ;; compares and selects) and returns its index when it is left for JavaScript, or converts it and goes back to
  ;; the fast path.
  (func (export "inverse") (param $ptr i32) (param $n i32) (param $tab i32) (param $np i32)
      (param $lowOk f64) (param $highOk f64) (result i32)
    (local $i i32) (local $at i32) (local $rp0 i32) (local $rp1 i32) (local $pp i32) (local $ki i32) (local $last i32)
    (local $e f64) (local $x f64) (local $k f64) (local $s0 f64) (local $t0 f64) (local $lo0 f64) (local $hi0 f64)
    (local $s v128) (local $t v128) (local $lo v128) (local $hi v128)
    (local $end i32) (local $w i32) (local $sp i32) (local $q i32)
    (local $low v128) (local $high v128) (local $v v128) (local $xv v128) (local $kv v128) (local $m v128)
    (local $st v128) (local $pm v128) (local $la v128) (local $ba v128) (local $c0 v128) (local $c1 v128)
    (local $r1 v128) (local $r2 v128) (local $r3 v128) (local $u1 v128) (local $u2 v128) (local $u3 v128)
    (local $lowIn f64) (local $highEx f64) (local $stJ v128) (local $pmJ v128) (local $laJ v128) (local $baJ v128) (local $lJ v128) (local $uJ v128)
    (local.set $lowIn (call $nextUp (local.get $lowOk)))
    (local.set $highEx (call $nextUp (local.get $highOk)))
    (local.set $low (f64x2.splat (local.get $lowOk)))
    (local.set $high (f64x2.splat (local.get $highOk)))
    ;; The last piece's header.
    (local.set $q (i32.add (local.get $tab) (i32.mul (i32.sub (local.get $np) (i32.const 1)) (i32.const 48))))
    (loop $block
      (block $slow
        ;; This block: the next (n - i) & ~1 elements, at most 256.
        (local.set $end (i32.sub (local.get $n) (local.get $i)))
        (local.set $end (i32.add (local.get $i) (i32.and
          (select (i32.const 256) (local.get $end) (i32.gt_u (local.get $end) (i32.const 256))) (i32.const -2))))
        (br_if $slow (i32.ge_u (local.get $i) (local.get $end)))
        (local.set $at (i32.add (local.get $ptr) (i32.shl (local.get $i) (i32.const 3))))
        ;; The piece of the block's first element (L <= e < U; the last piece if none).
        (local.set $e (f64.load (local.get $at)))
        (local.set $pp (local.get $tab))
        (block $hyp
          (loop $next
            (br_if $hyp (i32.ge_u (local.get $pp) (local.get $q)))
            (br_if $hyp (i32.eqz (f64.ge (local.get $e) (f64.load offset=40 (local.get $pp)))))
            (local.set $pp (i32.add (local.get $pp) (i32.const 48)))
            (br $next)))
        (local.set $stJ (v128.load64_splat (local.get $pp)))
        (local.set $pmJ (v128.load64_splat offset=8 (local.get $pp)))
        (local.set $laJ (v128.load64_splat offset=16 (local.get $pp)))
        (local.set $baJ (v128.load64_splat offset=24 (local.get $pp)))
        ;; [lJ, uJ): that piece's interval within the window (e > lowOk is e >= the float after lowOk).
        (local.set $lJ (f64x2.splat (f64.max (local.get $lowIn) (f64.load offset=32 (local.get $pp)))))
        (local.set $uJ (f64x2.splat (f64.min (local.get $highEx) (f64.load offset=40 (local.get $pp)))))
        ;; Pass 1: locate pairs from i, up to end or the first pair with an element outside (lowOk, highOk].
        (local.set $sp (i32.const 36864))
        (local.set $w (local.get $i))
        (block $located
          (loop $locate
            (local.set $v (v128.load (local.get $at)))
            (local.set $c0 (v128.load offset=16 (local.get $at)))
            (if (i32.and (i32.le_u (i32.add (local.get $w) (i32.const 4)) (local.get $end))
                  (i32.eq (i64x2.bitmask (v128.and
                    (v128.and (f64x2.ge (local.get $v) (local.get $lJ)) (f64x2.lt (local.get $v) (local.get $uJ)))
                    (v128.and (f64x2.ge (local.get $c0) (local.get $lJ)) (f64x2.lt (local.get $c0) (local.get $uJ)))))
                    (i32.const 3)))
              (then
                ;; Two pairs in that piece: its numbers, from registers. s and the two record addresses (in the
                ;; low 32 bits of each lane) per pair.
                (local.set $xv (f64x2.mul (f64x2.sub (local.get $v) (local.get $stJ)) (local.get $pmJ)))
                (local.set $kv (f64x2.pmin (local.get $laJ)
                  (f64x2.pmax (v128.load offset=3088 (i32.const 0)) (f64x2.floor (local.get $xv)))))
                (v128.store (local.get $sp)
                  (f64x2.sub (f64x2.mul (v128.load offset=3312 (i32.const 0)) (f64x2.sub (local.get $xv) (local.get $kv)))
                    (v128.load offset=3136 (i32.const 0))))
                (v128.store offset=16 (local.get $sp)
                  (f64x2.add (local.get $baJ) (f64x2.mul (local.get $kv) (v128.load offset=3392 (i32.const 0)))))
                (local.set $xv (f64x2.mul (f64x2.sub (local.get $c0) (local.get $stJ)) (local.get $pmJ)))
                (local.set $kv (f64x2.pmin (local.get $laJ)
                  (f64x2.pmax (v128.load offset=3088 (i32.const 0)) (f64x2.floor (local.get $xv)))))
                (v128.store offset=32 (local.get $sp)
                  (f64x2.sub (f64x2.mul (v128.load offset=3312 (i32.const 0)) (f64x2.sub (local.get $xv) (local.get $kv)))
                    (v128.load offset=3136 (i32.const 0))))
                (v128.store offset=48 (local.get $sp)
                  (f64x2.add (local.get $baJ) (f64x2.mul (local.get $kv) (v128.load offset=3392 (i32.const 0)))))
                (local.set $at (i32.add (local.get $at) (i32.const 32)))
                (local.set $sp (i32.add (local.get $sp) (i32.const 64)))
                (local.set $w (i32.add (local.get $w) (i32.const 4))))
              (else
                ;; One pair, each lane's piece: piece j while e >= L of piece j.
                (br_if $located (i32.ne (i64x2.bitmask
                  (v128.and (f64x2.gt (local.get $v) (local.get $low)) (f64x2.le (local.get $v) (local.get $high))))
                  (i32.const 3)))
                (local.set $st (v128.load64_splat (local.get $tab)))
                (local.set $pm (v128.load64_splat offset=8 (local.get $tab)))
                (local.set $la (v128.load64_splat offset=16 (local.get $tab)))
                (local.set $ba (v128.load64_splat offset=24 (local.get $tab)))
                (local.set $pp (local.get $tab))
                (block $pieced
                  (loop $piece
                    (br_if $pieced (i32.ge_u (local.get $pp) (local.get $q)))
                    (local.set $pp (i32.add (local.get $pp) (i32.const 48)))
                    (local.set $m (f64x2.ge (local.get $v) (v128.load64_splat offset=32 (local.get $pp))))
                    (local.set $st (v128.bitselect (v128.load64_splat (local.get $pp)) (local.get $st) (local.get $m)))
                    (local.set $pm (v128.bitselect (v128.load64_splat offset=8 (local.get $pp)) (local.get $pm) (local.get $m)))
                    (local.set $la (v128.bitselect (v128.load64_splat offset=16 (local.get $pp)) (local.get $la) (local.get $m)))
                    (local.set $ba (v128.bitselect (v128.load64_splat offset=24 (local.get $pp)) (local.get $ba) (local.get $m)))
                    (br $piece)))
                (local.set $xv (f64x2.mul (f64x2.sub (local.get $v) (local.get $st)) (local.get $pm)))
                (local.set $kv (f64x2.pmin (local.get $la)
                  (f64x2.pmax (v128.load offset=3088 (i32.const 0)) (f64x2.floor (local.get $xv)))))
                (v128.store (local.get $sp)
                  (f64x2.sub (f64x2.mul (v128.load offset=3312 (i32.const 0)) (f64x2.sub (local.get $xv) (local.get $kv)))
                    (v128.load offset=3136 (i32.const 0))))
                (v128.store offset=16 (local.get $sp)
                  (f64x2.add (local.get $ba) (f64x2.mul (local.get $kv) (v128.load offset=3392 (i32.const 0)))))
                (local.set $at (i32.add (local.get $at) (i32.const 16)))
                (local.set $sp (i32.add (local.get $sp) (i32.const 32)))
                (local.set $w (i32.add (local.get $w) (i32.const 2)))))
            (br_if $locate (i32.lt_u (local.get $w) (local.get $end)))))
        ;; Pass 2: evaluate the located pairs, up to w or the first pair with a segment not mirrored.
        (local.set $at (i32.add (local.get $ptr) (i32.shl (local.get $i) (i32.const 3))))
        (local.set $sp (i32.const 36864))
        (block $evaluated
          (loop $evaluate
            (br_if $evaluated (i32.ge_u (local.get $i) (local.get $w)))
            (local.set $rp0 (i32.load offset=16 (local.get $sp)))
            (local.set $rp1 (i32.load offset=24 (local.get $sp)))
            (local.set $s (v128.load (local.get $sp)))
            (if (i32.and (i32.le_u (i32.add (local.get $i) (i32.const 8)) (local.get $w))
                  (i32.and (i32.and (i32.and (i32.and (i32.and (i32.and (i32.eq (local.get $rp0) (local.get $rp1))
                  (i32.eq (local.get $rp0) (i32.load offset=48 (local.get $sp))))
                  (i32.eq (local.get $rp0) (i32.load offset=56 (local.get $sp))))
                  (i32.eq (local.get $rp0) (i32.load offset=80 (local.get $sp))))
                  (i32.eq (local.get $rp0) (i32.load offset=88 (local.get $sp))))
                  (i32.eq (local.get $rp0) (i32.load offset=112 (local.get $sp))))
                  (i32.eq (local.get $rp0) (i32.load offset=120 (local.get $sp)))))
              (then
                ;; 4 pairs in one segment: 4 chains side by side, each coefficient loaded once.
                (local.set $lo0 (f64.load offset=64 (local.get $rp0)))
                (local.set $hi0 (f64.load offset=72 (local.get $rp0)))
                (br_if $evaluated (i32.eqz (f64.le (local.get $lo0) (local.get $hi0))))
                (local.set $r1 (v128.load offset=32 (local.get $sp)))
                (local.set $r2 (v128.load offset=64 (local.get $sp)))
                (local.set $r3 (v128.load offset=96 (local.get $sp)))
                (local.set $c0 (v128.load64_splat offset=56 (local.get $rp0)))
                (local.set $t (local.get $c0))
                (local.set $u1 (local.get $c0))
                (local.set $u2 (local.get $c0))
                (local.set $u3 (local.get $c0))
                (local.set $c0 (v128.load64_splat offset=48 (local.get $rp0)))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s)) (local.get $c0)))
                (local.set $u1 (f64x2.add (f64x2.mul (local.get $u1) (local.get $r1)) (local.get $c0)))
                (local.set $u2 (f64x2.add (f64x2.mul (local.get $u2) (local.get $r2)) (local.get $c0)))
                (local.set $u3 (f64x2.add (f64x2.mul (local.get $u3) (local.get $r3)) (local.get $c0)))
                (local.set $c0 (v128.load64_splat offset=40 (local.get $rp0)))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s)) (local.get $c0)))
                (local.set $u1 (f64x2.add (f64x2.mul (local.get $u1) (local.get $r1)) (local.get $c0)))
                (local.set $u2 (f64x2.add (f64x2.mul (local.get $u2) (local.get $r2)) (local.get $c0)))
                (local.set $u3 (f64x2.add (f64x2.mul (local.get $u3) (local.get $r3)) (local.get $c0)))
                (local.set $c0 (v128.load64_splat offset=32 (local.get $rp0)))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s)) (local.get $c0)))
                (local.set $u1 (f64x2.add (f64x2.mul (local.get $u1) (local.get $r1)) (local.get $c0)))
                (local.set $u2 (f64x2.add (f64x2.mul (local.get $u2) (local.get $r2)) (local.get $c0)))
                (local.set $u3 (f64x2.add (f64x2.mul (local.get $u3) (local.get $r3)) (local.get $c0)))
                (local.set $c0 (v128.load64_splat offset=24 (local.get $rp0)))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s)) (local.get $c0)))
                (local.set $u1 (f64x2.add (f64x2.mul (local.get $u1) (local.get $r1)) (local.get $c0)))
                (local.set $u2 (f64x2.add (f64x2.mul (local.get $u2) (local.get $r2)) (local.get $c0)))
                (local.set $u3 (f64x2.add (f64x2.mul (local.get $u3) (local.get $r3)) (local.get $c0)))
                (local.set $c0 (v128.load64_splat offset=16 (local.get $rp0)))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s)) (local.get $c0)))
                (local.set $u1 (f64x2.add (f64x2.mul (local.get $u1) (local.get $r1)) (local.get $c0)))
                (local.set $u2 (f64x2.add (f64x2.mul (local.get $u2) (local.get $r2)) (local.get $c0)))
                (local.set $u3 (f64x2.add (f64x2.mul (local.get $u3) (local.get $r3)) (local.get $c0)))
                (local.set $c0 (v128.load64_splat offset=8 (local.get $rp0)))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s)) (local.get $c0)))
                (local.set $u1 (f64x2.add (f64x2.mul (local.get $u1) (local.get $r1)) (local.get $c0)))
                (local.set $u2 (f64x2.add (f64x2.mul (local.get $u2) (local.get $r2)) (local.get $c0)))
                (local.set $u3 (f64x2.add (f64x2.mul (local.get $u3) (local.get $r3)) (local.get $c0)))
                (local.set $c0 (v128.load64_splat (local.get $rp0)))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s)) (local.get $c0)))
                (local.set $u1 (f64x2.add (f64x2.mul (local.get $u1) (local.get $r1)) (local.get $c0)))
                (local.set $u2 (f64x2.add (f64x2.mul (local.get $u2) (local.get $r2)) (local.get $c0)))
                (local.set $u3 (f64x2.add (f64x2.mul (local.get $u3) (local.get $r3)) (local.get $c0)))
                (local.set $lo (f64x2.splat (local.get $lo0)))
                (local.set $hi (f64x2.splat (local.get $hi0)))
                (v128.store offset=0 (local.get $at) (f64x2.pmax (f64x2.pmin (local.get $t) (local.get $hi)) (local.get $lo)))
                (v128.store offset=16 (local.get $at) (f64x2.pmax (f64x2.pmin (local.get $u1) (local.get $hi)) (local.get $lo)))
                (v128.store offset=32 (local.get $at) (f64x2.pmax (f64x2.pmin (local.get $u2) (local.get $hi)) (local.get $lo)))
                (local.set $at (i32.add (local.get $at) (i32.const 48)))
                (local.set $sp (i32.add (local.get $sp) (i32.const 96)))
                (local.set $i (i32.add (local.get $i) (i32.const 6)))
                (local.set $t (local.get $u3)))
              (else
                ;; Else one pair, each lane's coefficients gathered two at a time.
                (local.set $c0 (v128.load offset=64 (local.get $rp0)))
                (local.set $c1 (v128.load offset=64 (local.get $rp1)))
                (local.set $lo (i8x16.shuffle 0 1 2 3 4 5 6 7 16 17 18 19 20 21 22 23 (local.get $c0) (local.get $c1)))
                (local.set $hi (i8x16.shuffle 8 9 10 11 12 13 14 15 24 25 26 27 28 29 30 31 (local.get $c0) (local.get $c1)))
                (br_if $evaluated (i32.ne (i64x2.bitmask (f64x2.le (local.get $lo) (local.get $hi))) (i32.const 3)))
                (local.set $c0 (v128.load offset=48 (local.get $rp0)))
                (local.set $c1 (v128.load offset=48 (local.get $rp1)))
                (local.set $t (i8x16.shuffle 8 9 10 11 12 13 14 15 24 25 26 27 28 29 30 31 (local.get $c0) (local.get $c1)))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s))
                  (i8x16.shuffle 0 1 2 3 4 5 6 7 16 17 18 19 20 21 22 23 (local.get $c0) (local.get $c1))))
                (local.set $c0 (v128.load offset=32 (local.get $rp0)))
                (local.set $c1 (v128.load offset=32 (local.get $rp1)))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s))
                  (i8x16.shuffle 8 9 10 11 12 13 14 15 24 25 26 27 28 29 30 31 (local.get $c0) (local.get $c1))))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s))
                  (i8x16.shuffle 0 1 2 3 4 5 6 7 16 17 18 19 20 21 22 23 (local.get $c0) (local.get $c1))))
                (local.set $c0 (v128.load offset=16 (local.get $rp0)))
                (local.set $c1 (v128.load offset=16 (local.get $rp1)))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s))
                  (i8x16.shuffle 8 9 10 11 12 13 14 15 24 25 26 27 28 29 30 31 (local.get $c0) (local.get $c1))))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s))
                  (i8x16.shuffle 0 1 2 3 4 5 6 7 16 17 18 19 20 21 22 23 (local.get $c0) (local.get $c1))))
                (local.set $c0 (v128.load (local.get $rp0)))
                (local.set $c1 (v128.load (local.get $rp1)))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s))
                  (i8x16.shuffle 8 9 10 11 12 13 14 15 24 25 26 27 28 29 30 31 (local.get $c0) (local.get $c1))))
                (local.set $t (f64x2.add (f64x2.mul (local.get $t) (local.get $s))
                  (i8x16.shuffle 0 1 2 3 4 5 6 7 16 17 18 19 20 21 22 23 (local.get $c0) (local.get $c1))))))
            (v128.store (local.get $at) (f64x2.pmax (f64x2.pmin (local.get $t) (local.get $hi)) (local.get $lo)))
            (local.set $at (i32.add (local.get $at) (i32.const 16)))
            (local.set $sp (i32.add (local.get $sp) (i32.const 32)))
            (local.set $i (i32.add (local.get $i) (i32.const 2)))
            (br $evaluate)))
        ;; The whole block done: the next one.
        (br_if $block (i32.eq (local.get $i) (local.get $end))))
      ;; Slow path: the element at i, alone (scalar; the same operations).
      (if (i32.ge_u (local.get $i) (local.get $n)) (then (return (local.get $n))))
      (local.set $at (i32.add (local.get $ptr) (i32.shl (local.get $i) (i32.const 3))))
      (local.set $e (f64.load (local.get $at)))
      (if (i32.eqz (i32.and (f64.gt (local.get $e) (local.get $lowOk)) (f64.le (local.get $e) (local.get $highOk))))
        (then (return (local.get $i))))
      (local.set $pp (local.get $tab))
      (block $found
        (loop $up
          (br_if $found (i32.ge_u (local.get $pp) (local.get $q)))
          (br_if $found (i32.eqz (f64.ge (local.get $e) (f64.load offset=40 (local.get $pp)))))
          (local.set $pp (i32.add (local.get $pp) (i32.const 48)))
          (br $up)))
      (local.set $x (f64.mul (f64.sub (local.get $e) (f64.load (local.get $pp))) (f64.load offset=8 (local.get $pp))))
      ;; k = floor(x), then k >= count ? count - 1 : k < 0 ? 0 : k, in integers: for x >= 0 the truncation is the
      ;; floor, and a negative x gives 0 either way (the same float k for s: +0 as in JavaScript; with x = -0,
      ;; x - k is -0 or +0, and s is -1 both ways).
      (local.set $ki (i32.trunc_sat_f64_s (local.get $x)))
      (local.set $last (i32.trunc_f64_s (f64.load offset=16 (local.get $pp))))
      (local.set $ki (select (local.get $last) (local.get $ki) (i32.gt_s (local.get $ki) (local.get $last))))
      (local.set $ki (select (i32.const 0) (local.get $ki) (i32.lt_s (local.get $ki) (i32.const 0))))
      (local.set $k (f64.convert_i32_s (local.get $ki)))
      (local.set $rp0 (i32.add (i32.load offset=24 (local.get $pp)) (i32.mul (local.get $ki) (i32.const 80))))
      (local.set $lo0 (f64.load offset=64 (local.get $rp0)))
      (local.set $hi0 (f64.load offset=72 (local.get $rp0)))
      ;; A segment not mirrored has NaN for its lower edge.
      (if (f64.ne (local.get $lo0) (local.get $lo0)) (then (return (local.get $i))))
      (local.set $s0 (f64.sub (f64.mul (f64.const 2) (f64.sub (local.get $x) (local.get $k))) (f64.const 1)))
      (local.set $t0 (f64.load offset=56 (local.get $rp0)))
      (local.set $t0 (f64.add (f64.mul (local.get $t0) (local.get $s0)) (f64.load offset=48 (local.get $rp0))))
      (local.set $t0 (f64.add (f64.mul (local.get $t0) (local.get $s0)) (f64.load offset=40 (local.get $rp0))))
      (local.set $t0 (f64.add (f64.mul (local.get $t0) (local.get $s0)) (f64.load offset=32 (local.get $rp0))))
      (local.set $t0 (f64.add (f64.mul (local.get $t0) (local.get $s0)) (f64.load offset=24 (local.get $rp0))))
      (local.set $t0 (f64.add (f64.mul (local.get $t0) (local.get $s0)) (f64.load offset=16 (local.get $rp0))))
      (local.set $t0 (f64.add (f64.mul (local.get $t0) (local.get $s0)) (f64.load offset=8 (local.get $rp0))))
      (local.set $t0 (f64.add (f64.mul (local.get $t0) (local.get $s0)) (f64.load (local.get $rp0))))
      ;; t < lo ? lo : t > hi ? hi : t
      (f64.store (local.get $at)
        (select (local.get $lo0)
          (select (local.get $hi0) (local.get $t0) (f64.gt (local.get $t0) (local.get $hi0)))
          (f64.lt (local.get $t0) (local.get $lo0))))
      (local.set $i (i32.add (local.get $i) (i32.const 1)))
      (br $block))
    (local.get $n))
)
