/**
 * A second, independent exact implementation: Python's `fractions` (standard library) run from the test. It reads
 * the inputs as the decimal text JavaScript prints for them (the same convention as the core's certifier), solves
 * the (bordered) normal equations by ordinary Gauss–Jordan elimination on Fractions, and returns the exact
 * coefficients as "num/den" text and as the nearest double (Python's float(Fraction) is correctly rounded).
 */
import { execFileSync } from 'node:child_process';

const SCRIPT = String.raw`
import json, sys
from fractions import Fraction as F
job = json.load(sys.stdin)
out = []
for p in job:
    u = [F(t) for t in p["u"]]; v = [F(t) for t in p["v"]]
    w = [F(t) for t in p["w"]] if p.get("w") else [F(1)] * len(u)
    powers = list(range(0 if p["intercept"] else 1, p["order"] + 1))
    cons = [(F(a), F(b)) for a, b in p.get("constraints", [])]
    size = len(powers) + len(cons)
    A = [[F(0)] * (size + 1 + size) for _ in range(size)]
    for j in range(size):
        A[j][size + 1 + j] = F(1)
    for j, pj in enumerate(powers):
        for k, pk in enumerate(powers):
            A[j][k] = sum(wi * ui ** (pj + pk) for wi, ui in zip(w, u))
        A[j][size] = sum(wi * ui ** pj * vi for wi, ui, vi in zip(w, u, v))
        for c, (cu, cv) in enumerate(cons):
            A[j][len(powers) + c] = cu ** pj
    for c, (cu, cv) in enumerate(cons):
        row = len(powers) + c
        for k, pk in enumerate(powers):
            A[row][k] = cu ** pk
        A[row][size] = cv
    for col in range(size):
        piv = next(r for r in range(col, size) if A[r][col] != 0)
        A[col], A[piv] = A[piv], A[col]
        for r in range(size):
            if r != col and A[r][col] != 0:
                f = A[r][col] / A[col][col]
                A[r] = [a - f * b for a, b in zip(A[r], A[col])]
    coef = [F(0)] * (p["order"] + 1)
    for j, pj in enumerate(powers):
        coef[pj] = A[j][size] / A[j][j]
    # Covariance s²·P (P: leading block of the bordered inverse, s² = S_r/(n − p + q)), or P alone when stated.
    sr = sum(wi * (vi - sum(c * ui ** k for k, c in enumerate(coef))) ** 2 for wi, ui, vi in zip(w, u, v))
    factor = F(1) if p.get("stated") else sr / (len(u) - len(powers) + len(cons))
    cov = [[0.0] * (p["order"] + 1) for _ in range(p["order"] + 1)]
    for j, pj in enumerate(powers):
        for k, pk in enumerate(powers):
            cov[pj][pk] = float(factor * A[j][size + 1 + k] / A[j][j])
    out.append({"exact": [f"{c.numerator}/{c.denominator}" for c in coef], "nearest": [float(c) for c in coef], "covariance": cov})
json.dump(out, sys.stdout)
`;

export interface PythonProblem {
  /** Decimal texts (String(value) of the doubles the core uses). */
  readonly u: readonly string[];
  readonly v: readonly string[];
  readonly w?: readonly string[];
  readonly order: number;
  readonly intercept: boolean;
  readonly constraints?: readonly (readonly [string, string])[];
  /** Covariance P alone (σ stated) instead of s²·P. */
  readonly stated?: boolean;
}

export interface PythonSolution {
  readonly exact: string[];
  readonly nearest: number[];
  /** Nearest doubles to the exact covariance of the coefficients (zero row and column for a fixed a_0). */
  readonly covariance: number[][];
}

/** Solve each problem exactly in Python. */
export function pythonExactLeastSquares(problems: readonly PythonProblem[]): PythonSolution[] {
  const output = execFileSync('python3', ['-c', SCRIPT], { input: JSON.stringify(problems), encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  return JSON.parse(output) as PythonSolution[];
}

/** Run a short Python expression over Fractions and return its printed result (for hand-sized checks). */
export function pythonFractions(expression: string): string {
  return execFileSync('python3', ['-c', `from fractions import Fraction as F\nprint(${expression})`], { encoding: 'utf8' }).trim();
}

const SOLVE_SCRIPT = String.raw`
import json, sys
from fractions import Fraction as F
job = json.load(sys.stdin)
K = [[F(x) for x in row] for row in job["K"]]; B = [[F(x) for x in row] for row in job["B"]]
size = len(K); A = [K[i] + B[i] for i in range(size)]
for col in range(size):
    piv = next(r for r in range(col, size) if A[r][col] != 0)
    A[col], A[piv] = A[piv], A[col]
    A[col] = [a / A[col][col] for a in A[col]]
    for r in range(size):
        if r != col and A[r][col] != 0:
            f = A[r][col]
            A[r] = [a - f * b for a, b in zip(A[r], A[col])]
json.dump([[f"{x.numerator}/{x.denominator}" for x in row[size:]] for row in A], sys.stdout)
`;

/** K⁻¹·B exactly by Gauss–Jordan on Python Fractions, as "num/den" texts (K and B given as integer texts). */
export function pythonSolve(K: readonly (readonly string[])[], B: readonly (readonly string[])[]): string[][] {
  const output = execFileSync('python3', ['-c', SOLVE_SCRIPT], { input: JSON.stringify({ K, B }), encoding: 'utf8' });
  return JSON.parse(output) as string[][];
}
