/**
 * The evaluator on a correlation page: type x, get y with its 95 % confidence and prediction intervals. The form
 * exists only when scripts run (it is built here, so a page without scripts shows no form that cannot work). It
 * refuses x outside the validity range and repeats the caution; the "Evaluate outside the validity range" box
 * allows it, with a loud warning that stays next to the value. The result region is a polite live region, so a
 * screen reader announces each answer. Evaluation only: no fitting happens in the browser.
 */
import { evaluatorSubject, type EvaluatorSubject } from './evaluatorModel.ts';
import { evaluatorResult } from './evaluatorResult.ts';
import { subjectInScale } from './evaluatorScale.ts';

function element<K extends keyof HTMLElementTagNameMap>(tag: K, properties: Partial<HTMLElementTagNameMap[K]> = {}, children: (Node | string)[] = []): HTMLElementTagNameMap[K] {
  const node = Object.assign(document.createElement(tag), properties);
  node.append(...children);
  return node;
}

/** The evaluator's section for one subject, wired up; not yet in the document. */
export function buildEvaluator(nativeSubject: EvaluatorSubject, snippet = ''): HTMLElement {
  let subject = nativeSubject;
  const { model, xName, xUnit } = subject;
  const input = element('input', { id: 'evaluator-x', type: 'text', inputMode: 'decimal', autocomplete: 'off', spellcheck: false, required: true });
  const extrapolate = element('input', { id: 'evaluator-extrapolate', type: 'checkbox' });
  const result = element('div', { className: 'evaluator-result', id: 'evaluator-result' });
  result.setAttribute('aria-live', 'polite');
  result.setAttribute('role', 'status');
  const unit = xUnit ? ` (${xUnit})` : '';
  const label = element('label', { htmlFor: 'evaluator-x' }, [`${xName}${unit}`]);
  const form = element('form', { className: 'evaluator-form', noValidate: true }, [
    label,
    ' ',
    input,
    ' ',
    element('button', { type: 'submit' }, ['Evaluate']),
    element('p', { className: 'evaluator-outside' }, [extrapolate, ' ', element('label', { htmlFor: 'evaluator-extrapolate' }, ['Evaluate outside the validity range (extrapolation; not valid)'])]),
  ]);
  input.placeholder = `${model.min} to ${model.max}`;
  input.setAttribute('aria-describedby', 'evaluator-range');

  const show = () => {
    if (input.value.trim() === '') {
      result.replaceChildren();
      return;
    }
    const answer = evaluatorResult(subject, input.value, extrapolate.checked);
    result.dataset['kind'] = answer.kind;
    if (answer.kind === 'invalid') {
      result.replaceChildren(element('p', {}, [answer.message]));
    } else if (answer.kind === 'refused') {
      result.replaceChildren(
        element('div', { className: 'caution evaluator-refused' }, [element('p', {}, [element('strong', {}, [answer.message])]), ...answer.cautions.map((caution) => element('p', {}, [caution]))]),
      );
    } else {
      const { estimate } = answer;
      const values = element('div', { className: 'evaluator-values' }, answer.lines.map((line) => element('p', {}, [line])));
      Object.assign(values.dataset, {
        x: String(estimate.x),
        y: String(estimate.y),
        confidenceLow: String(estimate.confidenceLow),
        confidenceHigh: String(estimate.confidenceHigh),
        predictionLow: String(estimate.predictionLow),
        predictionHigh: String(estimate.predictionHigh),
      });
      result.replaceChildren(...(answer.warning === null ? [] : [element('p', { className: 'evaluator-warning' }, [element('strong', {}, [answer.warning])])]), values);
    }
  };
  form.addEventListener('submit', (event) => {
    event.preventDefault();
    show();
  });
  extrapolate.addEventListener('change', show);

  const rangeText = () =>
    `Type ${xName} and press Evaluate: ${subject.yName} with its 95 % confidence interval (of the correlation) and 95 % prediction interval (of a new measurement), from the full-precision mapped form and its covariance — the same numbers as the code below. Validity range: ${subject.model.min} to ${subject.model.max}${subject.xUnit ? ` ${subject.xUnit}` : ''}.`;
  const range = element('p', { id: 'evaluator-range' }, [rangeText()]);
  // Follow the temperature scale chosen on the page (src/client/temperatureScale.ts): x, range and answer in it.
  document.addEventListener('correlary:scale', (event) => {
    const chosen = subjectInScale(nativeSubject, snippet, String((event as CustomEvent<{ scale: string }>).detail?.scale));
    if (chosen === null) return;
    subject = chosen;
    label.textContent = `${xName}${subject.xUnit ? ` (${subject.xUnit})` : ''}`;
    input.placeholder = `${subject.model.min} to ${subject.model.max}`;
    range.textContent = rangeText();
    show();
  });

  return element('section', { className: 'evaluator' }, [element('h2', { id: 'evaluate' }, ['Evaluate']), range, form, result]);
}

/** Build the evaluator from the page's `[data-evaluator]` element and put it after the plots (or the equation). */
export function mountEvaluator(root: Document = document): void {
  const source = root.querySelector<HTMLElement>('[data-evaluator]');
  const anchor = root.querySelector('section[aria-labelledby="plots"]') ?? root.querySelector('section[aria-labelledby="equation"]');
  if (source === null || anchor === null) return;
  try {
    const section = buildEvaluator(evaluatorSubject(source), source.querySelector('#snippet-javascript')?.textContent ?? '');
    section.setAttribute('aria-labelledby', 'evaluate');
    anchor.after(section);
  } catch (caught) {
    console.error(caught);
  }
}
