#include "textflag.h"

// func cpuid(leaf, sub uint32) (eax, ebx, ecx, edx uint32)
TEXT ·cpuid(SB), NOSPLIT, $0-24
	MOVL leaf+0(FP), AX
	MOVL sub+4(FP), CX
	CPUID
	MOVL AX, eax+8(FP)
	MOVL BX, ebx+12(FP)
	MOVL CX, ecx+16(FP)
	MOVL DX, edx+20(FP)
	RET

// func xgetbv() (eax uint32)
TEXT ·xgetbv(SB), NOSPLIT, $0-4
	MOVL $0, CX
	XGETBV
	MOVL AX, eax+0(FP)
	RET

// func mulAdd2x2AVX(c0, c1, a0, a1 *complex128, pairs int, coef *[32]float64)
//
// For i < 2·pairs: c0[i] += a0[i]·b00 + a1[i]·b10, c1[i] += a0[i]·b01 + a1[i]·b11.
// coef holds, for b00, b10, b01, b11 in turn, four copies of the real part
// and then (−im, im, −im, im), so that with a = (re, im) and its swap
// s = (im, re) a product is a·re + s·(−im, im).
TEXT ·mulAdd2x2AVX(SB), NOSPLIT, $0-48
	MOVQ c0+0(FP), DI
	MOVQ c1+8(FP), SI
	MOVQ a0+16(FP), R8
	MOVQ a1+24(FP), R9
	MOVQ pairs+32(FP), CX
	MOVQ coef+40(FP), AX
	VMOVUPD 0(AX), Y8
	VMOVUPD 32(AX), Y9
	VMOVUPD 64(AX), Y10
	VMOVUPD 96(AX), Y11
	VMOVUPD 128(AX), Y12
	VMOVUPD 160(AX), Y13
	VMOVUPD 192(AX), Y14
	VMOVUPD 224(AX), Y15
	TESTQ CX, CX
	JZ done

loop:
	VMOVUPD (R8), Y0
	VMOVUPD (R9), Y1
	VPERMILPD $5, Y0, Y2
	VPERMILPD $5, Y1, Y3
	VMOVUPD (DI), Y4
	VMOVUPD (SI), Y5
	VMULPD Y8, Y0, Y6
	VMULPD Y12, Y0, Y7
	VFMADD231PD Y9, Y2, Y4
	VFMADD231PD Y13, Y2, Y5
	VFMADD231PD Y10, Y1, Y6
	VFMADD231PD Y14, Y1, Y7
	VFMADD231PD Y11, Y3, Y4
	VFMADD231PD Y15, Y3, Y5
	VADDPD Y6, Y4, Y4
	VADDPD Y7, Y5, Y5
	VMOVUPD Y4, (DI)
	VMOVUPD Y5, (SI)
	ADDQ $32, DI
	ADDQ $32, SI
	ADDQ $32, R8
	ADDQ $32, R9
	DECQ CX
	JNZ loop

done:
	VZEROUPPER
	RET

// func sweepAVX(col, v, w, y, x *complex128, pairs int, coef *[24]float64, acc *[8]float64)
//
// For i < 2·pairs: col[i] += v[i]·p + w[i]·q, then y[i] += col[i]·r and
// acc gathers conj(col[i])·x[i] as two vectors, (re·re, im·im) sums and
// (re_col·im_x, im_col·re_x) sums. coef holds p, q, r in the layout of
// mulAdd2x2AVX.
TEXT ·sweepAVX(SB), NOSPLIT, $0-64
	MOVQ col+0(FP), DI
	MOVQ v+8(FP), SI
	MOVQ w+16(FP), R8
	MOVQ y+24(FP), R9
	MOVQ x+32(FP), R10
	MOVQ pairs+40(FP), CX
	MOVQ coef+48(FP), AX
	MOVQ acc+56(FP), DX
	VMOVUPD 0(AX), Y10
	VMOVUPD 32(AX), Y11
	VMOVUPD 64(AX), Y12
	VMOVUPD 96(AX), Y13
	VMOVUPD 128(AX), Y14
	VMOVUPD 160(AX), Y15
	VXORPD Y8, Y8, Y8
	VXORPD Y9, Y9, Y9
	TESTQ CX, CX
	JZ sweepdone

sweeploop:
	VMOVUPD (SI), Y0
	VPERMILPD $5, Y0, Y1
	VMOVUPD (DI), Y2
	VFMADD231PD Y10, Y0, Y2
	VFMADD231PD Y11, Y1, Y2
	VMOVUPD (R8), Y0
	VPERMILPD $5, Y0, Y1
	VFMADD231PD Y12, Y0, Y2
	VFMADD231PD Y13, Y1, Y2
	VMOVUPD Y2, (DI)
	VMOVUPD (R9), Y3
	VPERMILPD $5, Y2, Y4
	VFMADD231PD Y14, Y2, Y3
	VFMADD231PD Y15, Y4, Y3
	VMOVUPD Y3, (R9)
	VMOVUPD (R10), Y5
	VPERMILPD $5, Y5, Y6
	VFMADD231PD Y5, Y2, Y8
	VFMADD231PD Y6, Y2, Y9
	ADDQ $32, DI
	ADDQ $32, SI
	ADDQ $32, R8
	ADDQ $32, R9
	ADDQ $32, R10
	DECQ CX
	JNZ sweeploop

sweepdone:
	VMOVUPD Y8, 0(DX)
	VMOVUPD Y9, 32(DX)
	VZEROUPPER
	RET
