"""Checks, independently of the Go code, that the gate definitions package qasm writes for gates
outside qelib1.inc (iswap, iswapdg, ryy) and its cu3 expansion have exactly the textbook matrices
of package circuit's documentation, global phase included. Run: /usr/bin/python3 format_defs.py > format_defs.out
Matrices are in textbook operand order: the first operand is the most significant bit."""
import numpy as np
I=np.eye(2);H=np.array([[1,1],[1,-1]])/np.sqrt(2);S=np.diag([1,1j]);X=np.array([[0,1],[1,0]]);Y=np.array([[0,-1j],[1j,0]]);Z=np.diag([1,-1])
def rx(t): return np.cos(t/2)*I-1j*np.sin(t/2)*X
def rz(t): return np.diag([np.exp(-1j*t/2),np.exp(1j*t/2)])
def p(l): return np.diag([1,np.exp(1j*l)])
def u(t,f,l): return np.array([[np.cos(t/2),-np.exp(1j*l)*np.sin(t/2)],[np.exp(1j*f)*np.sin(t/2),np.exp(1j*(f+l))*np.cos(t/2)]])
def on(g,q,n=2):  # q index 0 = MSB (first operand)
    m=np.array([[1]])
    for k in range(n): m=np.kron(m,g if k==q else I)
    return m
CX01=np.array([[1,0,0,0],[0,1,0,0],[0,0,0,1],[0,0,1,0]])
SW=np.array([[1,0,0,0],[0,0,1,0],[0,1,0,0],[0,0,0,1]])
CX10=SW@CX01@SW
def seq(*ms):
    r=np.eye(ms[0].shape[0])
    for m in ms: r=m@r
    return r
iswap=np.array([[1,0,0,0],[0,0,1j,0],[0,1j,0,0],[0,0,0,1]])
A=seq(on(S,0),on(S,1),on(H,0),CX01,CX10,on(H,1))
print("iswap   max |entry diff|",np.abs(A-iswap).max())
B=seq(on(H,1),CX10,CX01,on(H,0),on(S.conj(),1),on(S.conj(),0))
print("iswapdg",np.abs(B-iswap.conj().T).max())
t=0.37
def rzz(t): return np.diag(np.exp(-1j*t/2*np.array([1,-1,-1,1])))
ryy=np.cos(t/2)*np.eye(4)-1j*np.sin(t/2)*np.kron(Y,Y)
C=seq(on(rx(np.pi/2),0),on(rx(np.pi/2),1),rzz(t),on(rx(-np.pi/2),0),on(rx(-np.pi/2),1))
print("ryy",np.abs(C-ryy).max())
th,f,l=0.3,1.1,-0.7
def ctrl(g): 
    m=np.eye(4,dtype=complex); m[2:,2:]=g; return m
D=seq(on(p((l+f)/2),0),on(p((l-f)/2),1),CX01,on(u(-th/2,0,-(f+l)/2),1),CX01,on(u(th/2,f,0),1))
print("cu3",np.abs(D-ctrl(u(th,f,l))).max())
print("numpy", np.__version__)
