import type { RevisionValueInput } from '@/lib/validation/revisions';
import { QUANTITIES } from '../properties/quantities';

/**
 * A validated value as its `revision_values` row: the unit is always the quantity's canonical
 * one. Shared by the editors' workflow and the seeds, so both store a value the same way.
 */
export function valueRow(
  v: RevisionValueInput,
  revisionId: number,
  position: number,
  sourceId: number | null,
) {
  return {
    revision_id: revisionId,
    quantity: v.quantity,
    variant: v.variant,
    value: v.value,
    unit: QUANTITIES[v.quantity].unit,
    low: v.low,
    high: v.high,
    sd: v.sd,
    samples: v.samples,
    method: v.method,
    ripeness: v.ripeness,
    temperature: v.temperature,
    storage: v.storage,
    loading_rate: v.loadingRate,
    probe: v.probe,
    note: v.note,
    is_typical_default: v.isTypicalDefault,
    stage: v.stage,
    observation: v.observation,
    typical_basis: v.typicalBasis,
    source_id: sourceId,
    position,
  };
}
