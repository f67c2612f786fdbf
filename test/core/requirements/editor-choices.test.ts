/**
 * Fields the editor offers as a list of words (type 'choice'): every word is
 * one the concept file accepts in that place, every word the file accepts is
 * offered, and each is shown in the trade's words. The runway surface is the
 * study case of a take-off run: it picks the rolling-friction band of
 * core/methods.md section 9.
 */
import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, parseConcept } from '../../../core';
import { REQUIREMENT_DESCRIPTORS } from '../../../core/requirements';

const trainer = DEMO_CONCEPTS.find((d) => d.slug === 'trainer')!.concept;

describe('choice fields of the requirement editor', () => {
  const withChoices = REQUIREMENT_DESCRIPTORS.flatMap((d) =>
    d.editorFields.filter((f) => f.value.type === 'choice').map((field) => ({ kind: d.kind, field })),
  );

  it('offer the runway surface on both take-off kinds, under More, and nowhere else', () => {
    expect(withChoices.map(({ kind, field }) => `${kind}.${field.key}`).sort()).toEqual(['takeoff-distance.runwaySurface', 'takeoff-ground-roll.runwaySurface']);
    for (const { field } of withChoices) {
      expect(field.title).toBe('Runway surface');
      expect(field.advanced).toBe(true);
      expect(field.defaultText).toBe('not stated');
      expect(field.help).toMatch(/only the studies read it/i);
    }
  });

  it('list paved, grass and soft, in words, and each is a value the concept file takes', () => {
    for (const { kind, field } of withChoices) {
      if (field.value.type !== 'choice') continue;
      expect(field.value.choices).toEqual([
        { value: 'paved', title: 'paved runway' },
        { value: 'grass', title: 'grass strip' },
        { value: 'soft', title: 'soft ground' },
      ]);
      const base = trainer.requirements.find((r) => r.kind === 'takeoff-ground-roll')!;
      for (const { value } of field.value.choices) {
        const requirement = { ...base, kind, distance: '400 m', runwaySurface: value };
        expect(parseConcept({ ...trainer, requirements: [requirement] }).ok, `${kind} ${value}`).toBe(true);
      }
      expect(parseConcept({ ...trainer, requirements: [{ ...base, kind, distance: '400 m', runwaySurface: 'ice' }] }).ok).toBe(false);
    }
  });
});
