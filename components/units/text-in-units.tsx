'use client';

import { textIn, type Text } from '@/lib/phrase';
import { useUnits } from './units-provider';

/** A sentence the server wrote about figures, its measures in the reader's units. */
export function TextInUnits({ text }: { text: Text }) {
  const { system } = useUnits();
  return <>{textIn(text, system)}</>;
}
