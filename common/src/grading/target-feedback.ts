import type { ColourJudgement } from '../colour/attributes/compare-colours.js';
import type { DeltaE2000Parts } from '../colour/difference/delta-e-2000.js';
import { labToLch } from '../colour/lab/lab-lch.js';
import { warmCoolIndex } from '../colour/attributes/warm-cool-index.js';
import type { Lab } from '../types/colour.js';
import type { FeedbackLine } from '../types/mark.js';
import { fixed1, fixed2, sentence, signed1 } from './format-numbers.js';
import { castRemedy, oppositeNeighbour, words } from './painter-words.js';

/** Terms of ΔE00 at or above this count as noticed (≈ the threshold of notice). */
export const noticeTerm = 1;

/** Which attributes a colour-feedback call may talk about. */
export type ColourFeedbackScope = { lightness?: boolean; chroma?: boolean; hue?: boolean };

/**
 * Feedback lines for one reading against its target, from the ΔE00 parts (the feedback
 * rules of docs/grading.md): an attribute is mentioned when its weighted term is at least
 * 1 (the threshold of notice) and at least a third of the largest term, largest first;
 * a failing reading always gets its largest term.
 */
export function colourFeedback(
  swatch: number,
  target: Lab,
  reading: Lab,
  parts: DeltaE2000Parts,
  judgement: ColourJudgement,
  pass: boolean,
  scope: ColourFeedbackScope = { lightness: true, chroma: true, hue: true },
): FeedbackLine[] {
  const severity = pass ? 'tip' : 'fix';
  const t = labToLch(target);
  const r = labToLch(reading);
  const terms = [
    { topic: 'lightness' as const, size: Math.abs(parts.lightnessTerm), on: scope.lightness },
    { topic: 'chroma' as const, size: Math.abs(parts.chromaTerm), on: scope.chroma },
    { topic: 'hue' as const, size: Math.abs(parts.hueTerm), on: scope.hue },
  ]
    .filter((term) => term.on)
    .sort((x, y) => y.size - x.size);
  if (terms.length === 0) return [];
  const largest = terms[0].size;
  const chosen = terms.filter(
    (term, k) => (term.size >= noticeTerm && term.size >= largest / 3) || (!pass && k === 0),
  );

  const lines: FeedbackLine[] = [];
  for (const { topic } of chosen) {
    if (topic === 'lightness') {
      lines.push({
        topic,
        severity,
        swatch,
        text: sentence(parts.deltaLPrime > 0 ? words.tooLight : words.tooDark),
        numbers: `L* ${fixed1(reading.L)} vs ${fixed1(target.L)} target (ΔL′ ${signed1(parts.deltaLPrime)}, ΔE00 lightness term ${signed1(parts.lightnessTerm)})`,
      });
    } else if (topic === 'chroma') {
      const cast = judgement.hueLean;
      const neutralTarget = t.C < 2;
      lines.push({
        topic,
        severity,
        swatch,
        text:
          neutralTarget && cast && parts.deltaCPrime > 0
            ? `Has a ${cast} cast: neutralise it with ${castRemedy[cast]}`
            : sentence(parts.deltaCPrime > 0 ? words.tooIntense : words.tooDull),
        numbers: `C* ${fixed1(r.C)} vs ${fixed1(t.C)} target (ΔC′ ${signed1(parts.deltaCPrime)}, ΔE00 chroma term ${signed1(parts.chromaTerm)})`,
      });
    } else {
      lines.push(hueLine(swatch, severity, target, reading, parts, judgement));
    }
  }
  return lines;
}

function hueLine(
  swatch: number,
  severity: 'tip' | 'fix',
  target: Lab,
  reading: Lab,
  parts: DeltaE2000Parts,
  judgement: ColourJudgement,
): FeedbackLine {
  const t = labToLch(target);
  const r = labToLch(reading);
  const lean = judgement.hueLean;
  const numbers = `h ${fixed1(r.h)}° vs ${fixed1(t.h)}° target (Δh′ ${signed1(parts.deltahPrime)}°, ΔE00 hue term ${signed1(parts.hueTerm)}; warm–cool index ${fixed2(warmCoolIndex(reading))} vs ${fixed2(warmCoolIndex(target))})`;
  if (lean === undefined) {
    return { topic: 'hue', severity, swatch, text: 'The hue is a little off', numbers };
  }
  const fix = oppositeNeighbour(lean, t.h);
  const paint = `a touch of a paint that leans ${fix}`;
  let text: string;
  if (judgement.temperature === 'cooler') {
    text = `Too cool: the hue has turned toward ${lean}; warm it with ${paint}`;
  } else if (judgement.temperature === 'warmer') {
    text = `Too warm: the hue has turned toward ${lean}; cool it with ${paint}`;
  } else {
    text = `The hue has turned toward ${lean}: bring it back with ${paint}`;
  }
  return { topic: 'hue', severity, swatch, text, numbers };
}
