import type { GridDensity } from '@mui/x-data-grid';
import { useState } from 'react';

const STORAGE_KEY = 'evenset.grid-density';
const DENSITIES: readonly GridDensity[] = ['compact', 'standard', 'comfortable'];

function readDensity(): GridDensity {
  try {
    const stored = window.localStorage.getItem(STORAGE_KEY);
    return DENSITIES.find((density) => density === stored) ?? 'standard';
  } catch {
    return 'standard';
  }
}

/** Row spacing is a per-device choice (tight at a desk, roomy on a tablet), so it is remembered here. */
export function useStoredDensity(): [GridDensity, (density: GridDensity) => void] {
  const [density, setDensity] = useState(readDensity);
  const change = (next: GridDensity) => {
    setDensity(next);
    try {
      window.localStorage.setItem(STORAGE_KEY, next);
    } catch {
      // Private browsing may refuse storage; the choice then lasts for this visit only.
    }
  };
  return [density, change];
}
