'use client';

import { createContext, useContext, type ReactNode } from 'react';
import { displayUnit, formatMeasure, fromDisplay, toDisplay, type UnitSystem } from '@/lib/units';

const UnitsContext = createContext<UnitSystem>('si');

/** The signed-in user's display units, for every client component below the app layout. */
export function UnitsProvider({ system, children }: { system: UnitSystem; children: ReactNode }) {
  return <UnitsContext.Provider value={system}>{children}</UnitsContext.Provider>;
}

/** Show and read values in the user's units; everything sent to the server stays SI. */
export function useUnits() {
  const system = useContext(UnitsContext);
  return {
    system,
    unit: (si: string) => displayUnit(si, system),
    show: (value: number, si: string) => formatMeasure(value, si, system),
    toDisplay: (value: number, si: string) => toDisplay(value, si, system),
    fromDisplay: (value: number, si: string) => fromDisplay(value, si, system),
  };
}
