/**
 * The evaluator in the temperature scale the reader chose (src/client/temperatureScale.ts announces it as a
 * `correlary:scale` event). The JavaScript snippet on the page carries, per scale, the validity range and the
 * mapped variable's centre and half-width in that scale (`SCALES`, exact conversions of the native ones, rounded
 * once); the mapped coefficients and their covariance are the same in every scale. So the subject in scale S is the
 * native one with S's range and mapping, its noise profile's x moved to S by the same affine map, and S as the unit
 * of x: every number the evaluator prints (x, range, refusal) is then in S.
 *
 * @example subjectInScale(subject, snippetText, '°F')?.model.min // => the range minimum in °F
 */
import { snippetConstants, type EvaluatorSubject } from './evaluatorModel.ts';

/** The subject with x in `scale`, or null when the snippet carries no such scale (x is not a temperature). */
export function subjectInScale(subject: EvaluatorSubject, snippet: string, scale: string): EvaluatorSubject | null {
  const constants = snippetConstants(snippet);
  const scales = constants['SCALES'] as Record<string, [number, number, number, number]> | undefined;
  const native = constants['NATIVE_SCALE'];
  const entry = scales?.[scale];
  const nativeEntry = typeof native === 'string' ? scales?.[native] : undefined;
  if (entry === undefined || nativeEntry === undefined || !Object.hasOwn(scales!, scale)) return null;
  if (scale === native) return subject;
  const [min, max, center, halfWidth] = entry;
  const toScale = (x: number) => center + (halfWidth * (x - nativeEntry[2])) / nativeEntry[3];
  return { ...subject, xUnit: scale, model: { ...subject.model, min, max, center, halfWidth, noiseX: subject.model.noiseX.map(toScale) } };
}
