import type { AirborneV1 } from '../case/v1/schema.js';
import { quantityText } from './read-quantity.js';

type Put = (id: string, text: string, value?: unknown) => void;

/** Answers that say what a hand-written airborne analysis says. */
export function airborneAnswers(put: Put, p: string, a: AirborneV1): void {
  put(`${p}.look`, 'airborne');
  put(`${p}.air.distance`, quantityText(a.distance));
  put(`${p}.air.drop`, quantityText(a.drop));
  put(`${p}.air.grade`, a.takeoffGrade === undefined ? '' : quantityText(a.takeoffGrade));
}
