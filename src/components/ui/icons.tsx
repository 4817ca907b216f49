import type { SVGProps } from 'react';

/** Seamrun's icon set: 24-unit grid, 1.8 stroke, rounded ends, a dashed "stitch" where it fits. */
const base = (props: SVGProps<SVGSVGElement>) => ({
  width: 20,
  height: 20,
  viewBox: '0 0 24 24',
  fill: 'none',
  stroke: 'currentColor',
  strokeWidth: 1.8,
  strokeLinecap: 'round' as const,
  strokeLinejoin: 'round' as const,
  'aria-hidden': true,
  ...props,
});

export const IconHome = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><path d="M4 11l8-6 8 6v8a1 1 0 0 1-1 1h-4v-5h-6v5H5a1 1 0 0 1-1-1z" /></svg>
);
export const IconDress = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><path d="M9 3l-1 5 -3 12h14L16 8l-1-5" /><path d="M9 3c1 1.5 5 1.5 6 0" /><path d="M8 11h8" strokeDasharray="1.5 1.8" /></svg>
);
export const IconBatch = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><rect x="4" y="5" width="16" height="5" rx="1.5" /><rect x="4" y="14" width="16" height="5" rx="1.5" /><path d="M7 7.5h6M7 16.5h4" /></svg>
);
export const IconPeople = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><circle cx="9" cy="8" r="3" /><path d="M3.5 19c.8-3 3-4.5 5.5-4.5s4.7 1.5 5.5 4.5" /><circle cx="17" cy="9" r="2.3" /><path d="M16 14.6c2 .1 3.6 1.4 4.3 3.9" /></svg>
);
export const IconSettings = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><circle cx="12" cy="12" r="3" /><path d="M12 3v3M12 18v3M3 12h3M18 12h3M5.6 5.6l2.1 2.1M16.3 16.3l2.1 2.1M5.6 18.4l2.1-2.1M16.3 7.7l2.1-2.1" /></svg>
);
export const IconScissors = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><circle cx="6" cy="7" r="2.5" /><circle cx="6" cy="17" r="2.5" /><path d="M8 8.5L20 17M8 15.5L20 7" /></svg>
);
export const IconMarker = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><rect x="3" y="5" width="18" height="14" rx="1.5" /><path d="M7 5v14M13 5l-2 14M17 5v14" strokeDasharray="2 1.6" /></svg>
);
export const IconNeedle = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><path d="M4 20L18 6" /><ellipse cx="19" cy="5" rx="1.6" ry="1" transform="rotate(-45 19 5)" /><path d="M4 13c3 0 4 3 7 3" strokeDasharray="1.6 1.8" /></svg>
);
export const IconCoins = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><ellipse cx="9" cy="7" rx="5" ry="2.5" /><path d="M4 7v4c0 1.4 2.2 2.5 5 2.5s5-1.1 5-2.5V7" /><path d="M10 16.5c.6 1.2 2.6 2 5 2 2.8 0 5-1.1 5-2.5v-4c0-1.4-2.2-2.5-5-2.5" /></svg>
);
export const IconChart = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><path d="M4 20V4M4 20h16" /><path d="M7 15l4-4 3 3 5-6" /></svg>
);
export const IconOut = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><path d="M14 5h4a1 1 0 0 1 1 1v12a1 1 0 0 1-1 1h-4" /><path d="M10 8l-4 4 4 4M6 12h9" /></svg>
);
export const IconAlert = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><path d="M12 4l9 16H3z" /><path d="M12 10v4M12 17v.5" /></svg>
);
export const IconPlus = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><path d="M12 5v14M5 12h14" /></svg>
);
export const IconMenu = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><path d="M4 7h16M4 12h16M4 17h16" /></svg>
);
export const IconMail = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><rect x="3" y="6" width="18" height="13" rx="1.5" /><path d="M3.5 7l8.5 6 8.5-6" /></svg>
);
/** A pattern piece with its grainline and notches (pattern & grading). */
export const IconPattern = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><path d="M6 3h8l4 5v13H6z" /><path d="M12 7v10M10.5 15.5L12 17l1.5-1.5" /><path d="M6 10h1.5M6 14h1.5" /></svg>
);
/** A delivery van (suppliers). */
export const IconTruck = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><path d="M3 7h11v9H3zM14 10h4l3 3v3h-7" /><circle cx="7" cy="17.5" r="1.6" /><circle cx="17" cy="17.5" r="1.6" /></svg>
);
/** A price tag with its string (costing). */
export const IconTag = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><path d="M3 12V4h8l9 9-8 8z" /><circle cx="7.5" cy="8.5" r="1.4" /></svg>
);
/** A list with a clock (audit trail). */
export const IconAudit = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><path d="M4 6h9M4 11h6M4 16h5" /><circle cx="16.5" cy="15" r="4.5" /><path d="M16.5 12.8V15l1.6 1.2" /></svg>
);
/** A magnifying glass (search). */
export const IconSearch = (p: SVGProps<SVGSVGElement>) => (
  <svg {...base(p)}><circle cx="10.5" cy="10.5" r="6" /><path d="M15 15l5 5" /></svg>
);
