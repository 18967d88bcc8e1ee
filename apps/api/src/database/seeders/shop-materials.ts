import type { MaterialInput } from '@evenset/contracts';

/**
 * Common shop materials, expansion coefficients in 1e-6/K near 20 °C. "firm" values were read in
 * the named source; "from memory" ones are recalled handbook values to be checked before use.
 */
export const SHOP_MATERIALS: MaterialInput[] = [
  {
    name: 'Hardened steel (gauge-block steel)',
    expansionPerK: 11.5,
    source: 'ISO 3650:1998; JCGM 100:2008 (GUM) example H.1',
    confidence: 'firm',
  },
  {
    name: 'Aluminium 6061-T6',
    expansionPerK: 23.6,
    source: 'Published 6061-T6 property data, mean over 20–100 °C',
    confidence: 'firm',
  },
  {
    name: 'Chromium carbide',
    expansionPerK: 8.4,
    source: 'Gauge-block makers’ data for chromium-carbide blocks',
    confidence: 'firm',
  },
  {
    name: 'Tungsten carbide',
    expansionPerK: 4.5,
    source: 'From memory: handbook range about 4.2–4.5, depends on cobalt content',
    confidence: 'from memory',
  },
  {
    name: 'Grey cast iron',
    expansionPerK: 10.8,
    source: 'From memory: handbook value, varies with grade',
    confidence: 'from memory',
  },
  {
    name: 'Tool steel',
    expansionPerK: 11,
    source: 'From memory: handbook range about 10–12, depends on grade and hardening',
    confidence: 'from memory',
  },
  {
    name: 'Granite',
    expansionPerK: 6.3,
    source: 'From memory: typical surface-plate granite',
    confidence: 'from memory',
  },
];

export const STEEL = SHOP_MATERIALS[0]!;
