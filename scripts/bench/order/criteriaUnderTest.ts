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
  readonly criterion: OrderCriterion;
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
    { label: '8g rule 8, ≥2 dof (k ≤ n−3)', criterion: createLowestJustifiedCriterion({ alpha: 0.05, multiplicity: 'none', looTolerance: null, minResidualDof: 2 }), isDefault: false },
    { label: '10 χ² σ stated (95 %)', criterion: chiSquareCriterion, isDefault: false },
  ];
  if (explore) {
    for (const alpha of [0.05, 0.1]) {
      list.push(variant(`Bonf α=${alpha}, no LOO`, { alpha, multiplicity: 'bonferroni', looTolerance: null, minResidualDof: 2 }));
      for (const tolerance of [0.05, 0.1, 0.15, 0.2, 0.3]) {
        list.push(variant(`Bonf α=${alpha}, τ=${tolerance}`, { alpha, multiplicity: 'bonferroni', looTolerance: tolerance, minResidualDof: 2 }));
      }
    }
    for (const tolerance of [0.1, 0.2]) {
      list.push(variant(`α=.01 each, τ=${tolerance}`, { alpha: 0.01, multiplicity: 'none', looTolerance: tolerance, minResidualDof: 2 }));
    }
  }
  return list;
}
