import { z } from 'zod';

/** How far a coefficient can be trusted: read in a published source, or recalled and to be checked. */
export const MATERIAL_CONFIDENCES = ['firm', 'from memory'] as const;
export const materialConfidenceSchema = z.enum(MATERIAL_CONFIDENCES, { error: 'Choose firm or from memory.' });
export type MaterialConfidence = z.infer<typeof materialConfidenceSchema>;

export const materialSchema = z.object({
  id: z.string(),
  name: z.string(),
  /** Linear thermal expansion coefficient near 20 °C, in 1e-6/K. */
  expansionPerK: z.number(),
  source: z.string(),
  confidence: materialConfidenceSchema,
});
export type Material = z.infer<typeof materialSchema>;

export const materialInputSchema = z.object({
  name: z.string({ error: 'Enter a name.' }).trim().min(1, 'Enter a name.').max(100, 'Use at most 100 characters.'),
  expansionPerK: z
    .number({ error: 'Enter the expansion coefficient in 1e-6/K, e.g. 11.5.' })
    .min(-5, 'An expansion coefficient below −5 × 10⁻⁶/K is not a shop material.')
    .max(100, 'An expansion coefficient above 100 × 10⁻⁶/K is not a shop material.'),
  source: z
    .string({ error: 'Name the source of the coefficient.' })
    .trim()
    .min(1, 'Name the source of the coefficient.')
    .max(300, 'Use at most 300 characters.'),
  confidence: materialConfidenceSchema,
});
export type MaterialInput = z.infer<typeof materialInputSchema>;
