;; The CQC kernel of the analysis engine (combination.ts, strictUpperProducts), in WebAssembly
;; with 128-bit SIMD: two doubles per instruction, and no bounds checks in the inner loop.
;; Built into cqc-kernel.wasm.ts by `npm run build:wasm -w backend` (the wabt package); a unit
;; test checks that the built module is this text.
;;
;; For row-major blocks x (rows x stride) and rho (stride x stride, symmetric), writes
;; t[r][i] = sum_{j<i} rho[i][j] x[r][j] into t (rows x stride). rows and stride must be
;; multiples of 4 (padded with zeros), so that the tile of four rows of x and two rows of rho
;; below always reads whole pairs of j. All pointers are byte offsets into the memory.
(module
  (memory (export "memory") 1)
  (func (export "strictUpperProducts")
    (param $x i32) (param $rows i32) (param $stride i32) (param $rho i32) (param $t i32)
    (local $r i32) (local $i i32) (local $jb i32) (local $ib i32) (local $rowBytes i32)
    (local $xr i32) (local $tr i32) (local $p i32) (local $q i32) (local $at i32)
    (local $xa i32) (local $xb i32) (local $xc i32) (local $xd i32)
    (local $a0 v128) (local $a1 v128) (local $b0 v128) (local $b1 v128) (local $c0 v128) (local $c1 v128) (local $d0 v128) (local $d1 v128)
    (local $v v128) (local $vp v128) (local $vq v128) (local $rq f64)
    (local.set $rowBytes (i32.shl (local.get $stride) (i32.const 3)))
    (local.set $r (i32.const 0))
    (block $rowsDone
      (loop $rowsLoop
        (br_if $rowsDone (i32.ge_u (local.get $r) (local.get $rows)))
        (local.set $xr (i32.add (local.get $x) (i32.mul (local.get $r) (local.get $rowBytes))))
        (local.set $tr (i32.add (local.get $t) (i32.mul (local.get $r) (local.get $rowBytes))))
      (local.set $xa (local.get $xr))
      (local.set $xb (i32.add (local.get $xr) (i32.mul (local.get $rowBytes) (i32.const 1))))
      (local.set $xc (i32.add (local.get $xr) (i32.mul (local.get $rowBytes) (i32.const 2))))
      (local.set $xd (i32.add (local.get $xr) (i32.mul (local.get $rowBytes) (i32.const 3))))
        (local.set $i (i32.const 0))
        (block $columnsDone
          (loop $columnsLoop
            (br_if $columnsDone (i32.ge_u (local.get $i) (local.get $stride)))
            (local.set $ib (i32.shl (local.get $i) (i32.const 3)))
            (local.set $p (i32.add (local.get $rho) (i32.mul (local.get $i) (local.get $rowBytes))))
            (local.set $q (i32.add (local.get $p) (local.get $rowBytes)))
        (local.set $a0 (v128.const f64x2 0 0)) (local.set $a1 (v128.const f64x2 0 0))
        (local.set $b0 (v128.const f64x2 0 0)) (local.set $b1 (v128.const f64x2 0 0))
        (local.set $c0 (v128.const f64x2 0 0)) (local.set $c1 (v128.const f64x2 0 0))
        (local.set $d0 (v128.const f64x2 0 0)) (local.set $d1 (v128.const f64x2 0 0))
            (local.set $jb (i32.const 0))
            (block $pairsDone
              (loop $pairsLoop
                (br_if $pairsDone (i32.ge_u (local.get $jb) (local.get $ib)))
                (local.set $vp (v128.load (i32.add (local.get $p) (local.get $jb))))
                (local.set $vq (v128.load (i32.add (local.get $q) (local.get $jb))))
          (local.set $v (v128.load (i32.add (local.get $xa) (local.get $jb))))
          (local.set $a0 (f64x2.add (local.get $a0) (f64x2.mul (local.get $v) (local.get $vp))))
          (local.set $a1 (f64x2.add (local.get $a1) (f64x2.mul (local.get $v) (local.get $vq))))
          (local.set $v (v128.load (i32.add (local.get $xb) (local.get $jb))))
          (local.set $b0 (f64x2.add (local.get $b0) (f64x2.mul (local.get $v) (local.get $vp))))
          (local.set $b1 (f64x2.add (local.get $b1) (f64x2.mul (local.get $v) (local.get $vq))))
          (local.set $v (v128.load (i32.add (local.get $xc) (local.get $jb))))
          (local.set $c0 (f64x2.add (local.get $c0) (f64x2.mul (local.get $v) (local.get $vp))))
          (local.set $c1 (f64x2.add (local.get $c1) (f64x2.mul (local.get $v) (local.get $vq))))
          (local.set $v (v128.load (i32.add (local.get $xd) (local.get $jb))))
          (local.set $d0 (f64x2.add (local.get $d0) (f64x2.mul (local.get $v) (local.get $vp))))
          (local.set $d1 (f64x2.add (local.get $d1) (f64x2.mul (local.get $v) (local.get $vq))))
                (local.set $jb (i32.add (local.get $jb) (i32.const 16)))
                (br $pairsLoop)))
            ;; t[i] takes j < i; t[i+1] also takes j = i, the triangle inside the tile.
            (local.set $rq (f64.load (i32.add (local.get $q) (local.get $ib))))
        (local.set $at (i32.add (local.get $tr) (local.get $ib)))
        (f64.store (local.get $at)
          (f64.add (f64x2.extract_lane 0 (local.get $a0)) (f64x2.extract_lane 1 (local.get $a0))))
        (f64.store offset=8 (local.get $at)
          (f64.add
            (f64.add (f64x2.extract_lane 0 (local.get $a1)) (f64x2.extract_lane 1 (local.get $a1)))
            (f64.mul (local.get $rq) (f64.load (i32.add (local.get $xa) (local.get $ib))))))
        (local.set $at (i32.add (i32.add (local.get $tr) (i32.mul (local.get $rowBytes) (i32.const 1))) (local.get $ib)))
        (f64.store (local.get $at)
          (f64.add (f64x2.extract_lane 0 (local.get $b0)) (f64x2.extract_lane 1 (local.get $b0))))
        (f64.store offset=8 (local.get $at)
          (f64.add
            (f64.add (f64x2.extract_lane 0 (local.get $b1)) (f64x2.extract_lane 1 (local.get $b1)))
            (f64.mul (local.get $rq) (f64.load (i32.add (local.get $xb) (local.get $ib))))))
        (local.set $at (i32.add (i32.add (local.get $tr) (i32.mul (local.get $rowBytes) (i32.const 2))) (local.get $ib)))
        (f64.store (local.get $at)
          (f64.add (f64x2.extract_lane 0 (local.get $c0)) (f64x2.extract_lane 1 (local.get $c0))))
        (f64.store offset=8 (local.get $at)
          (f64.add
            (f64.add (f64x2.extract_lane 0 (local.get $c1)) (f64x2.extract_lane 1 (local.get $c1)))
            (f64.mul (local.get $rq) (f64.load (i32.add (local.get $xc) (local.get $ib))))))
        (local.set $at (i32.add (i32.add (local.get $tr) (i32.mul (local.get $rowBytes) (i32.const 3))) (local.get $ib)))
        (f64.store (local.get $at)
          (f64.add (f64x2.extract_lane 0 (local.get $d0)) (f64x2.extract_lane 1 (local.get $d0))))
        (f64.store offset=8 (local.get $at)
          (f64.add
            (f64.add (f64x2.extract_lane 0 (local.get $d1)) (f64x2.extract_lane 1 (local.get $d1)))
            (f64.mul (local.get $rq) (f64.load (i32.add (local.get $xd) (local.get $ib))))))
            (local.set $i (i32.add (local.get $i) (i32.const 2)))
            (br $columnsLoop)))
        (local.set $r (i32.add (local.get $r) (i32.const 4)))
        (br $rowsLoop)))))
