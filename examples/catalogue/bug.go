package catalogue

import (
	"qcheck.dev/examples/peephole"
	"qcheck.dev/examples/peephole/shortcut"
	"qcheck.dev/qcheck"
)

// A Bug is one entry of the catalogue: a pass with a mistake in it and the same pass written
// correctly.
type Bug struct {
	// Name is a short identifier, such as "ZThroughTarget".
	Name string
	// Kind is the family of mistake, such as "commutation" or "periodicity".
	Kind string
	// Says describes the mistake in a line.
	Says string
	// Wrong is the pass with the mistake; Correct keeps the meaning of every circuit.
	Wrong, Correct qcheck.Pass
}

// Bugs returns the catalogue, one entry per mistake, in a fixed order.
func Bugs() []Bug {
	opt := peephole.Optimize
	return []Bug{
		{"ZThroughTarget", "commutation", "rz, p, z, s, t slide through a cx on either operand (only the control commutes)", shortcut.ZThroughTarget, opt},
		{"XThroughControl", "commutation", "x, rx, sx slide through a cx on either operand (only the target commutes)", xThroughControl, opt},
		{"HAsDiagonal", "commutation", "h is taken to commute with diagonal gates", hAsDiagonal, opt},
		{"CXCancelBlind", "cancellation", "cx(a,b)·cx(b,a) cancel: orientation is not checked", cxCancelBlind, opt},
		{"SSelfInverse", "cancellation", "s·s cancel as if s were its own inverse (s·s = z)", sSelfInverse, opt},
		{"RZRXMerge", "merge", "rz(α)·rx(β) on one qubit merge into rz(α+β)", rzRXMerge, opt},
		{"CPAsCRZ", "merge", "cp and crz on the same pair merge as one controlled phase (drops a relative phase)", shortcut.CPAsCRZ, opt},
		{"SdgAsS", "merge", "the phase table gives sdg the angle +π/2 of s", sdgAsS, opt},
		{"PhaseModPi", "periodicity", "phase gates (p, z, s, t...) merge with their angles added mod π, not mod 2π", phaseModPi, opt},
		{"ControlledPeriod2Pi", "periodicity", "crz, crx, cry merge with their angles added mod 2π, not mod 4π", controlledPeriod2Pi, opt},
		{"DropRotation2Pi", "periodicity", "rotations whose angle is a multiple of 2π are dropped, controlled ones too", dropRotation2Pi.apply, dropRotation4Pi.apply},
		{"CPLoweringDropsPhase", "lowering", "cp(λ) lowered to cx and p without the p(λ/2) on the control", cpLoweringDropsPhase.apply, cpLowering.apply},
		{"CXToCZMissingH", "lowering", "cx lowered to h·cz without the closing h on the target", cxToCZMissingH.apply, cxToCZ.apply},
		{"EulerOrder", "lowering", "u(θ,φ,λ) lowered to rz(φ), ry(θ), rz(λ) in time order (reversed)", eulerReversed.apply, euler.apply},
		{"RZZOnControl", "lowering", "rzz(θ) lowered to cx·rz(θ)·cx with the rz on the control", rzzOnControl.apply, rzzLowering.apply},
		{"CCXMissingTdg", "decomposition", "the ccx network of N&C Fig. 4.9 without its last tdg", ccxMissingTdg.apply, ccxNetwork.apply},
		{"CCXOffByOne", "decomposition", "the ccx network with one t on operand 1 instead of operand 0", ccxOffByOne.apply, ccxNetwork.apply},
		{"HXHWrongQubit", "pattern", "h·x·h → z matched without checking the qubit of the x", hxhAnyX, hxhSameQubit},
		{"SwapSlideKeepsDirection", "pattern", "cx moved before a swap keeps its operands instead of exchanging them", swapSlideKeeps, swapSlide},
	}
}
