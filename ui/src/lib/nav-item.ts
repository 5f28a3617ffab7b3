import type { ComponentType } from 'react';
import type { Role } from '@holdfast/shared';

/** One entry in the frame's navigation. */
export interface NavItem {
  label: string;
  to: string;
  icon: ComponentType<{ size?: number | string; stroke?: number; 'aria-hidden'?: boolean }>;
  /** Only these roles see the link (the server still enforces access). Omit for everyone. */
  roles?: readonly Role[];
  /** Match only the exact path (for `/`). */
  end?: boolean;
}
