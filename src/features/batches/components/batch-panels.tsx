import type { ComponentType } from 'react';
import type { BatchDto } from '@shared/schemas/batches';

/** Panels that later areas (cut plan, line plan, costing) add to the batch page, in order. */
export const BATCH_PANELS: { key: string; Panel: ComponentType<{ batch: BatchDto }> }[] = [];
