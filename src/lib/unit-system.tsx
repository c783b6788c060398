import type { UnitSystem } from '@shared/units';
import { createContext, type ReactNode, useContext } from 'react';

const UnitSystemContext = createContext<UnitSystem>('SI');

/** Provides the signed-in person's unit preference to every unit-aware input and figure below it. */
export function UnitSystemProvider({ value, children }: { value: UnitSystem; children: ReactNode }) {
  return <UnitSystemContext.Provider value={value}>{children}</UnitSystemContext.Provider>;
}

export function useUnitSystem(): UnitSystem {
  return useContext(UnitSystemContext);
}
