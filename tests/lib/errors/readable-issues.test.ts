/** Validation problems read as the field's label and a sentence (the messages of the daily-use trial). */
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { fieldLabel, readableIssue, readableSummary, sentence } from '../../../src/lib/errors/readable-issues';
import { revisionContentSchema } from '../../../src/lib/recipe';

const issuesOf = (error: z.ZodError) => error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));

describe('readable validation problems', () => {
  it('reads the draft edit that showed "phosphors.0.opticalFraction: Too small: …" and "received NaN"', () => {
    const schema = z.object({ phosphors: z.array(z.object({ opticalFraction: z.number().min(0) })), pumpLeakFraction: z.number() });
    const r = schema.safeParse({ phosphors: [{ opticalFraction: -0.1 }], pumpLeakFraction: Number.NaN });
    expect(readableSummary(issuesOf(r.error!))).toBe('Optical fraction of phosphor 1: must be at least 0; Pump leak: must be a number');
  });

  it('names batch planning fields by their labels', () => {
    expect(readableIssue({ path: 'sizing.batchMassG', message: 'Too small: expected number to be >0' })).toBe(
      'Batch mass: must be more than 0'
    );
    expect(readableIssue({ path: 'silicone.toleranceA.tolerance', message: 'Too big: expected number to be <=10' })).toBe(
      'Tolerance of silicone part A: must be at most 10'
    );
  });

  it('drops a path the message already led with, and keeps a schema-written sentence', () => {
    expect(readableIssue({ path: 'pump', message: 'pump: choose a pump' })).toBe('Pump: choose a pump');
    expect(sentence('CCT must be 1000–20000 K')).toBe('CCT must be 1000–20000 K');
    expect(readableIssue({ path: '(body)', message: 'expected a JSON object' })).toBe('Expected a JSON object');
  });

  it('words a field the table lacks instead of showing its path', () => {
    expect(fieldLabel('lots.2.lotNumber')).toBe('Lot number');
    expect(fieldLabel('')).toBe('');
  });

  it('leaves no internal path in what the revision content schema says about a bad draft', () => {
    const r = revisionContentSchema.safeParse({ phosphors: [{ opticalFraction: 2 }], pumpLeakFraction: 'x' });
    const text = readableSummary(issuesOf(r.error!));
    expect(text).not.toMatch(/\b\w+\.\d+\.\w+/);
    expect(text).not.toMatch(/Too small|Too big|Invalid input/);
  });
});
