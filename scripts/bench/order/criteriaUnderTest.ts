/**
 * The criteria the benchmark compares: the default rule first, then every baseline criterion, then (with
 * --explore) variants of the default rule used to choose its parameters.
 */
import {
  adjustedRSquaredCriterion,
  aiccCriterion,
  allHigherFCriterion,
  bicCriterion,
  chiSquareCriterion,
  createChiSquareCriterion,
  createLowestJustifiedCriterion,
  lowestJustifiedCriterion,
  pressCriterion,
  residualVarianceCriterion,
  sequentialFCriterion,
  LOWEST_JUSTIFIED_DEFAULTS,
  type LowestJustifiedParameters,
  type OrderCriterion,
} from '../../../src/core/order/index.ts';

export interface NamedCriterion {
  readonly label: string;
  /** null for the oracle rows, which know the truth. */
  readonly criterion: OrderCriterion | null;
  readonly isDefault: boolean;
}

const BASE = LOWEST_JUSTIFIED_DEFAULTS;

function variant(label: string, changes: Partial<LowestJustifiedParameters>): NamedCriterion {
  return { label: `x ${label}`, criterion: createLowestJustifiedCriterion({ ...BASE, ...changes }), isDefault: false };
}

export function criteriaUnderTest(explore: boolean): NamedCriterion[] {
  const list: NamedCriterion[] = [
    { label: '★ default: lowest justified', criterion: lowestJustifiedCriterion, isDefault: true },
    { label: '1 s² min', criterion: residualVarianceCriterion, isDefault: false },
    { label: '3 adj-R² max', criterion: adjustedRSquaredCriterion, isDefault: false },
    { label: '4 AICc min', criterion: aiccCriterion, isDefault: false },
    { label: '5 BIC min', criterion: bicCriterion, isDefault: false },
    { label: '6 LOOCV (PRESS) min', criterion: pressCriterion, isDefault: false },
    { label: '7 sequential F (α=.05)', criterion: sequentialFCriterion, isDefault: false },
    { label: '8 lowest ≡ all higher (α=.05)', criterion: allHigherFCriterion, isDefault: false },
    {
      label: '8g rule 8, ≥2 dof (k ≤ n−3)',
      criterion: createLowestJustifiedCriterion({ ...BASE, alpha: 0.05, lowDofAlpha: null, lookAhead: null, multiplicity: 'none' }),
      isDefault: false,
    },
    { label: '10 χ² σ stated (95 %), unguarded', criterion: createChiSquareCriterion(1), isDefault: false },
    { label: '★ χ² mode: σ stated, ≥2 dof', criterion: chiSquareCriterion, isDefault: false },
  ];
  if (explore) {
    // The grid the default's parameters were chosen from (window W, α, low-dof α, PRESS guard).
    list.push(variant('all higher, Bonf α=0.05', { lookAhead: null, lowDofAlpha: null }));
    list.push(variant('all higher, Bonf α=0.1', { lookAhead: null, lowDofAlpha: null, alpha: 0.1 }));
    list.push(variant('all higher, Bonf α=0.1, PRESS τ=0.15 conf .05', { lookAhead: null, lowDofAlpha: null, alpha: 0.1, looTolerance: 0.15, looConfirmAlpha: 0.05 }));
    list.push(variant('W=2, Bonf α=0.05 (no low-dof α)', { lowDofAlpha: null }));
    list.push(variant('W=2, Bonf α=0.1', { lowDofAlpha: null, alpha: 0.1 }));
    list.push(variant('W=2, α=0.05 / 0.15 if dof<10', { lowDofAlpha: 0.15 }));
    list.push(variant('W=2, α=0.05 / 0.1 if dof<6', { lowDofBelow: 6 }));
    list.push(variant('W=3, α=0.05 / 0.1 if dof<10', { lookAhead: 3 }));
    list.push(variant('W=1, α=0.05 / 0.1 if dof<10', { lookAhead: 1 }));
    list.push(variant('default + PRESS τ=0.15 conf .05', { looTolerance: 0.15, looConfirmAlpha: 0.05 }));
    list.push(variant('default + PRESS τ=0.1, no confirmation', { looTolerance: 0.1 }));
  }
  return list;
}
