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
    A = [[F(0)] * (size + 1) for _ in range(size)]
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
    out.append({"exact": [f"{c.numerator}/{c.denominator}" for c in coef], "nearest": [float(c) for c in coef]})
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
}

export interface PythonSolution {
  readonly exact: string[];
  readonly nearest: number[];
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
