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
  createLowestJustifiedCriterion,
  lowestJustifiedCriterion,
  pressCriterion,
  residualVarianceCriterion,
  sequentialFCriterion,
  type LowestJustifiedParameters,
  type OrderCriterion,
} from '../../../src/core/order/index.ts';

export interface NamedCriterion {
  readonly label: string;
  /** null for the oracle rows, which know the truth. */
  readonly criterion: OrderCriterion | null;
  readonly isDefault: boolean;
}

function variant(label: string, parameters: LowestJustifiedParameters): NamedCriterion {
  return { label: `x ${label}`, criterion: createLowestJustifiedCriterion(parameters), isDefault: false };
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
    { label: '8g rule 8, ≥2 dof (k ≤ n−3)', criterion: createLowestJustifiedCriterion({ alpha: 0.05, multiplicity: 'none', looTolerance: null, looConfirmAlpha: null, minResidualDof: 2 }), isDefault: false },
    { label: '10 χ² σ stated (95 %)', criterion: chiSquareCriterion, isDefault: false },
  ];
  if (explore) {
    // The grid the default's parameters were chosen from (α, τ, confirmation level).
    for (const alpha of [0.05, 0.1]) {
      list.push(variant(`Bonf α=${alpha}, no LOO`, { alpha, multiplicity: 'bonferroni', looTolerance: null, looConfirmAlpha: null, minResidualDof: 2 }));
    }
    for (const tolerance of [0.1, 0.15, 0.2, 0.3]) {
      list.push(variant(`Bonf α=0.1, τ=${tolerance} conf .05`, { alpha: 0.1, multiplicity: 'bonferroni', looTolerance: tolerance, looConfirmAlpha: 0.05, minResidualDof: 2 }));
    }
    list.push(variant('Bonf α=0.05, τ=0.1 conf .05', { alpha: 0.05, multiplicity: 'bonferroni', looTolerance: 0.1, looConfirmAlpha: 0.05, minResidualDof: 2 }));
    list.push(variant('Bonf α=0.1, τ=0.15 conf .025', { alpha: 0.1, multiplicity: 'bonferroni', looTolerance: 0.15, looConfirmAlpha: 0.025, minResidualDof: 2 }));
    list.push(variant('Bonf α=0.1, τ=0.15 conf .1', { alpha: 0.1, multiplicity: 'bonferroni', looTolerance: 0.15, looConfirmAlpha: 0.1, minResidualDof: 2 }));
    list.push(variant('Bonf α=0.1, τ=0.1, no confirmation', { alpha: 0.1, multiplicity: 'bonferroni', looTolerance: 0.1, looConfirmAlpha: null, minResidualDof: 2 }));
  }
  return list;
}
