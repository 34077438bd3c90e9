/** The grade bands a class belongs to; below both src/lib/auth (class input schemas) and src/lib/db (class rows). */
export const GRADE_BANDS = ['K-2', '3-5', '6-8', '9-12'] as const;
export type GradeBand = (typeof GRADE_BANDS)[number];
