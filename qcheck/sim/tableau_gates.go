package sim

import (
	"fmt"
	"math"
	"math/cmplx"
	"sync"

	"qcheck.dev/qcheck/circuit"
)

// CliffordTolerance is how close, entry by entry, a gate's conjugate M P M† of each Pauli string P
// on its operands must come to ± a Pauli string for the tableau to accept the gate as Clifford.
// For the rotations rx, ry, rz, p, u, rxx, ryy, rzz (accepted at multiples of π/2) and cp, crx,
// cry, crz (accepted at multiples of π) this means the angle lies within about 1e-12 rad of such a
// multiple, so each accepted gate is within about 1e-12 in operator norm of the exact Clifford
// gate the tableau uses: far below the default tolerance of 1e-9 for circuits of up to a few
// hundred such gates, and far above the rounding of an angle written as k·π/2 in floating point.
const CliffordTolerance = 1e-12

// maxCliffordQubits is the widest gate the tableau analyses; the standard library has no Clifford
// gate on three qubits, but a custom one may be.
const maxCliffordQubits = 3

// pauliMap is how a Clifford gate on k qubits conjugates the 4^k Pauli strings on its operands.
// A local string is encoded in 2k bits: bit 2j is the X part and bit 2j+1 the Z part of operand j
// (both set is Y). image[p] holds the encoding of the image of p, with bit 2k set when the image
// carries the sign −1.
//
// The bit part of the image is linear over GF(2) in the bits of p (images of products are
// products of images, and a product's bits are the sum of its factors' bits), so output bit b is
// the sum of the input bits i with linear[b][i] set; linear holds all-ones or zero words so the
// tableau can apply it to 64 rows at once without branches. The sign is not linear: negated
// lists the strings whose image carries −1.
type pauliMap struct {
	k        int
	identity bool
	image    []uint8
	linear   [2 * maxCliffordQubits][2 * maxCliffordQubits]uint64
	negated  []uint8
}

// analysePauliMap returns the map of a k-qubit gate with row-major matrix m (textbook operand
// order: operand 0 is the most significant bit of the local index), or an explanation of why the
// gate is not Clifford.
func analysePauliMap(m []complex128, k int) (*pauliMap, string) {
	if k > maxCliffordQubits {
		return nil, fmt.Sprintf("the tableau analyses gates on at most %d qubits", maxCliffordQubits)
	}
	d := 1 << k
	pm := &pauliMap{k: k, identity: true, image: make([]uint8, 1<<(2*k))}
	tmp := make([]complex128, d*d)
	q := make([]complex128, d*d)
	for p := 1; p < 1<<(2*k); p++ {
		// q = M P M†, with P a signed permutation: (M P)_{ij} = M_{i,π(j)} phase(j).
		perm, ph := pauliAction(uint8(p), k)
		for i := 0; i < d; i++ {
			for j := 0; j < d; j++ {
				// P|j⟩ = ph[j]|perm[j]⟩, so column j of M P is ph[j]·column perm[j] of M.
				tmp[i*d+j] = m[i*d+perm[j]] * ph[j]
			}
		}
		for i := 0; i < d; i++ {
			for j := 0; j < d; j++ {
				var s complex128
				for l := 0; l < d; l++ {
					s += tmp[i*d+l] * cmplx.Conj(m[j*d+l])
				}
				q[i*d+j] = s
			}
		}
		img, ok := identifyPauli(q, k)
		if !ok {
			return nil, fmt.Sprintf("conjugating %s by the gate does not give ± a Pauli string within %g; only Clifford gates (rotations at multiples of π/2) have a tableau", localString(uint8(p), k), CliffordTolerance)
		}
		pm.image[p] = img
		if int(img) != p {
			pm.identity = false
		}
	}
	for i := 0; i < 2*k; i++ {
		for b := 0; b < 2*k; b++ {
			if pm.image[1<<i]>>b&1 == 1 {
				pm.linear[b][i] = ^uint64(0)
			}
		}
	}
	for p := 1; p < len(pm.image); p++ {
		if pm.image[p]>>(2*k)&1 == 1 {
			pm.negated = append(pm.negated, uint8(p))
		}
		// The linearity above is a theorem; check it rather than trust it.
		lin := uint8(0)
		for i := 0; i < 2*k; i++ {
			if p>>i&1 == 1 {
				lin ^= pm.image[1<<i]
			}
		}
		if mask := uint8(1)<<(2*k) - 1; lin&mask != pm.image[p]&mask {
			return nil, "its action on Pauli strings is not linear, which no unitary allows"
		}
	}
	return pm, ""
}

// pauliAction returns the action of the local string p on basis states: P|j⟩ = ph[j]|perm[j]⟩.
// Each operand contributes X|b⟩ = |1−b⟩, Z|b⟩ = (−1)^b|b⟩, Y|b⟩ = i(−1)^b|1−b⟩
// (Nielsen & Chuang §2.1.3 / §4.2).
func pauliAction(p uint8, k int) ([]int, []complex128) {
	d := 1 << k
	perm := make([]int, d)
	ph := make([]complex128, d)
	for j := 0; j < d; j++ {
		to, f := j, complex(1, 0)
		for op := 0; op < k; op++ {
			bit := uint(k - 1 - op) // operand op is bit k−1−op of the local index
			x, z := p>>(2*op)&1, p>>(2*op+1)&1
			b := j >> bit & 1
			if z == 1 && b == 1 {
				f = -f
			}
			if x == 1 {
				to ^= 1 << bit
				if z == 1 {
					f *= 1i
				}
			}
		}
		perm[j], ph[j] = to, f
	}
	return perm, ph
}

// identifyPauli decides whether the d×d matrix q equals ±P for a local Pauli string P within
// CliffordTolerance, and returns P's encoding with bit 2k carrying the sign.
func identifyPauli(q []complex128, k int) (uint8, bool) {
	d := 1 << k
	// A Pauli string maps |0⟩ to a multiple of |x⟩, x its X part: find the largest entry of column 0.
	x := 0
	for i := 1; i < d; i++ {
		if cmplx.Abs(q[i*d]) > cmplx.Abs(q[x*d]) {
			x = i
		}
	}
	var enc uint8
	for op := 0; op < k; op++ {
		bit := uint(k - 1 - op)
		if x>>bit&1 == 1 {
			enc |= 1 << (2 * op)
		}
		// The Z part of operand op shows as a sign flip between columns 0 and 1<<bit.
		j := 1 << bit
		if r := q[(x^j)*d+j] / q[x*d]; real(r) < 0 {
			enc |= 1 << (2*op + 1)
		}
	}
	perm, ph := pauliAction(enc, k)
	sign := complex(1, 0)
	if real(q[perm[0]*d]/ph[0]) < 0 {
		sign, enc = -1, enc|1<<(2*k)
	}
	for j := 0; j < d; j++ {
		for i := 0; i < d; i++ {
			want := complex(0, 0)
			if i == perm[j] {
				want = sign * ph[j]
			}
			if cmplx.Abs(q[i*d+j]-want) > CliffordTolerance || math.IsNaN(real(q[i*d+j])) {
				return 0, false
			}
		}
	}
	return enc, true
}

// localString writes a local Pauli encoding with operand positions, as in "X⊗Z".
func localString(p uint8, k int) string {
	s := ""
	for op := 0; op < k; op++ {
		if op > 0 {
			s += "⊗"
		}
		s += string("IXZY"[p>>(2*op)&3])
	}
	return s
}

// fixedMaps holds the maps of the standard library's gates without angles that are Clifford,
// built once from their matrices.
var fixedMaps = sync.OnceValue(func() map[string]*pauliMap {
	out := map[string]*pauliMap{}
	for _, s := range circuit.Standard() {
		if !s.Clifford || s.Params != 0 {
			continue
		}
		g, err := circuit.NewGate(s.Name)
		if err != nil {
			panic(err) // the library lists its own gates; this cannot fail
		}
		pm, why := analysePauliMap(g.Elements(), s.Qubits)
		if pm == nil {
			panic("sim: standard gate " + s.Name + " is flagged Clifford but " + why)
		}
		out[s.Name] = pm
	}
	return out
})

// angleKey identifies a gate with angles for the per-circuit cache of maps: its name and each
// angle's nearest multiple of π/2, as a count of quarter turns mod 8 (every library gate has
// period 4π in each angle).
type angleKey struct {
	name  string
	turns [3]int
}

// mapCache finds the Pauli map of each op, analysing gates with angles once per distinct rounded
// angle, and rounding each distinct list of angles once (exact rounding costs a few
// microseconds).
type mapCache struct {
	maps    map[angleKey]*pauliMap
	rounded map[rawAngles]roundedAngles
}

// rawAngles and roundedAngles memoise cliffordAngles.
type rawAngles struct {
	name   string
	params [3]float64
}

type roundedAngles struct {
	turns [3]int
	dev   float64
	why   string
}

func newMapCache() *mapCache {
	return &mapCache{maps: map[angleKey]*pauliMap{}, rounded: map[rawAngles]roundedAngles{}}
}

// lookup returns the op's map, nil for an op the tableau skips (barrier, id, or any gate that
// acts as the identity), or an error naming the op. It also returns the op's deviation (see
// cliffordAngles): 0 for gates without angles, NaN for custom gates, which have none. The map of
// a gate with angles is analysed from its matrix at the rounded angles k·π/2 with k in −3…4, far
// from where floating point loses digits, and is the map of the exact Clifford gate there.
func (mc *mapCache) lookup(i int, op circuit.Op) (*pauliMap, float64, error) {
	g := op.Gate
	refuse := func(why string) error { return &circuit.OpError{Index: i, Gate: g.Name, Err: why} }
	if g.Name == "barrier" {
		return nil, 0, nil
	}
	if !op.Unitary() {
		return nil, 0, refuse("not a unitary operation (a measure, a reset or a classically controlled gate); a tableau describes unitary Clifford circuits only")
	}
	if pm, ok := fixedMaps()[g.Name]; ok && !g.IsCustom() {
		if pm.identity {
			return nil, 0, nil
		}
		return pm, 0, nil
	}
	spec, std := circuit.Lookup(g.Name)
	if std && !g.IsCustom() && spec.Params == 0 {
		return nil, 0, refuse("not a Clifford gate; the tableau engine needs a Clifford circuit")
	}
	if g.IsCustom() {
		// Custom gates may share names, so each occurrence is analysed on its own.
		pm, why := analysePauliMap(g.Elements(), g.Qubits())
		if pm == nil {
			return nil, 0, refuse(why)
		}
		if pm.identity {
			return nil, 0, nil
		}
		return pm, math.NaN(), nil
	}
	raw := rawAngles{name: g.Name}
	copy(raw.params[:], g.Params)
	ra, done := mc.rounded[raw]
	if !done {
		ra.turns, ra.dev, ra.why = cliffordAngles(g)
		mc.rounded[raw] = ra
	}
	turns, dev, why := ra.turns, ra.dev, ra.why
	if why != "" {
		return nil, 0, refuse(why)
	}
	key := angleKey{name: g.Name, turns: turns}
	pm, seen := mc.maps[key]
	if !seen {
		rounded := circuit.Gate{Name: g.Name, Params: make([]float64, len(g.Params))} // the exact Clifford gate
		for k := range rounded.Params {
			t := key.turns[k]
			if t > 4 {
				t -= 8
			}
			rounded.Params[k] = float64(t) * (math.Pi / 2)
		}
		var why string
		pm, why = analysePauliMap(rounded.Elements(), g.Qubits())
		if pm == nil {
			return nil, 0, refuse(why)
		}
		mc.maps[key] = pm
	}
	if pm.identity {
		return nil, dev, nil
	}
	return pm, dev, nil
}

// cliffordAngles rounds the angles of a library gate to multiples of π/2, as counts of quarter
// turns mod 8, and returns the gate's deviation: a bound, in operator norm up to global phase, on
// how far the gate is from the same gate at the rounded angles. The deviation is Σ|δ| over the
// exact offsets δ of the angles from their multiples (circuit.QuarterTurns), because every
// library gate's derivative in each of its angles has operator norm at most 1 (½ for the
// rotations exp(−iθP/2) and their controlled forms, 1 for p, cp and u), so moving an angle by δ
// moves the gate by at most |δ|. It explains the refusal when an offset exceeds
// CliffordTolerance.
//
// One gate is Clifford away from such angles: u(θ, φ, λ) with θ a multiple of π, where the
// matrix above shows u = ±diag(1, e^{i(φ+λ)}) for θ ≡ 0 (mod 2π) and
// u = ±e^{iλ}·[[0, −1], [e^{i(φ−λ)}, 0]] for θ ≡ π, which depend, up to phase, only on φ+λ or φ−λ.
// Those are rounded instead (exactly, as sums), and the gate becomes u(θ, φ±λ, 0).
func cliffordAngles(g circuit.Gate) (turns [3]int, dev float64, why string) {
	spec, _ := circuit.Lookup(g.Name)
	var offsets [3]float64
	worst := -1
	for k, p := range g.Params {
		turns[k], offsets[k] = circuit.QuarterTurns(p)
		dev += math.Abs(offsets[k])
		if !(math.Abs(offsets[k]) <= CliffordTolerance) && worst < 0 {
			worst = k
		}
	}
	if worst > 0 && g.Name == "u" && turns[0]%2 == 0 && math.Abs(offsets[0]) <= CliffordTolerance {
		lambda := g.Params[2]
		if turns[0]%4 == 2 {
			lambda = -lambda
		}
		t, off := circuit.QuarterTurns(g.Params[1], lambda)
		if math.Abs(off) <= CliffordTolerance {
			return [3]int{turns[0], t, 0}, math.Abs(offsets[0]) + math.Abs(off), ""
		}
	}
	if worst >= 0 {
		p := g.Params[worst]
		return turns, 0, fmt.Sprintf("angle %d (%s) = %s is %.3g from the nearest multiple of π/2; only Clifford gates (rotations at multiples of π/2) have a tableau",
			worst+1, spec.AngleName(worst), circuit.FormatAngle(p), math.Abs(offsets[worst]))
	}
	return turns, dev, ""
}
