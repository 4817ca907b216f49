import type { ComponentType } from 'react';
import type { RouteObject } from 'react-router';
import type { Role } from '@shared/auth/permissions';
import type { BatchDto } from '@shared/schemas/batches';
import type { NavItem } from '@/components/layouts/app-shell';

/** What a feature area adds to the app: its routes, menu entries, role homes and batch panels. */
export interface FeatureManifest {
  routes?: RouteObject[];
  nav?: NavItem[];
  /** A home page for a role (the owner's home is the foundation's). */
  homes?: Partial<Record<Role, ComponentType<{ name: string }>>>;
  /** Panels shown on the batch page, in manifest order. */
  batchPanels?: { key: string; Panel: ComponentType<{ batch: BatchDto }> }[];
  /** What to tell a person before they sign out (their work still waiting on this device), or null. */
  beforeSignOut?: (userId: number) => string | null;
}
