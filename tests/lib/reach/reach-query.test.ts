import { describe, expect, it } from 'vitest';
import { ReachReportQuerySchema, ReachFiguresQuerySchema } from '../../../src/lib/reach/reach-query';

describe('reach query years', () => {
  it('takes a quarter of this century and refuses one whose year has no four-digit date form in range', () => {
    expect(ReachReportQuerySchema.safeParse({ quarter: '2026-Q3' }).success).toBe(true);
    for (const quarter of ['0710-Q3', '0000-Q1', '2100-Q1', '1999-Q4']) {
      const parsed = ReachReportQuerySchema.safeParse({ quarter });
      expect(parsed.success, quarter).toBe(false);
      expect(parsed.error?.issues[0]?.message, quarter).toMatch(/year from 2000 to 2099/);
    }
  });

  it('refuses from/to dates outside the years a record can have', () => {
    expect(ReachFiguresQuerySchema.safeParse({ from: '0710-01-01', to: '2026-01-01' }).success).toBe(false);
    expect(ReachFiguresQuerySchema.safeParse({ from: '2026-01-01', to: '2026-04-01' }).success).toBe(true);
  });
});
