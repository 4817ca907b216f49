/** Paths of the grading area. */
export const gradingPaths = {
  index: { path: '/grading', getHref: () => '/grading' },
  style: { path: '/styles/:id/grading', getHref: (styleId: number) => `/styles/${styleId}/grading` },
} as const;
