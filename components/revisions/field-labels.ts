import type { ValueField } from '@/lib/validation/revision-form';

/** What each field of a value row is called on screen (number labels add the unit). */
export const FIELD_LABELS: Record<ValueField, string> = {
  quantity: 'Quantity',
  variant: 'Variant or surface',
  value: 'Value',
  low: 'Low',
  high: 'High',
  sd: 'Std. dev.',
  samples: 'Samples (n)',
  method: 'Method',
  ripeness: 'Ripeness',
  temperature: 'Temperature',
  storage: 'Storage',
  loadingRate: 'Loading rate',
  probe: 'Probe or plate',
  note: 'Note',
  stage: 'Ripeness stage',
  observation: 'What was observed (drop and impact figures)',
  isTypicalDefault: 'Typical default',
  typicalBasis: 'Why the typical value is kept',
  sourceKey: 'Source',
};
