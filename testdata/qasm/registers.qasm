// Two quantum registers, broadcasting, a nested user gate with parameter arithmetic,
// and qelib1 gates that map onto other names (common practice, no source).
OPENQASM 2.0;
include "qelib1.inc";
qreg a[2];
qreg b[2];
creg m[2];
gate rot(theta, phi) x { rz(theta/2) x; ry(-phi^2) x; }
gate pair(theta) x, y { rot(theta, 2*pi/3) x; cx x, y; rot(-theta, sin(pi/6)) y; }
h a;
cx a, b;
pair(0.25) a[0], b[1];
u3(0.1, 0.2, 0.3) b[0];
u2(0, pi) a[1];
u1(pi/4) a[0];
cu1(-pi/8) a[0], b[0];
cu3(1, 2, 3) b[1], a[1];
reset b;
measure b -> m;
