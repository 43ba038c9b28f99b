import { describe, expect, it } from 'vitest';
import { decisionLine, decisionSubject, isoDateTime } from '../../app/review/decisionSubject';

const oil = (name: string, role: 'in-service' | 'proposed' | 'candidate') => ({ name, role }) as never;

describe('what a decision approves', () => {
  it('names the change from the in-service oil to the one proposed oil', () => {
    const review = { oils: [oil('VG 220 R&O', 'in-service'), oil('VG 320 EP', 'proposed'), oil('VG 460 EP', 'candidate')] };
    expect(decisionLine({ decision: 'approved' }, review)).toBe('Approved: the change from the in-service oil “VG 220 R&O” to the proposed oil “VG 320 EP”');
  });
  it('with several proposals or no oil at all: the review as a whole', () => {
    expect(decisionSubject({ oils: [oil('A', 'in-service'), oil('B', 'proposed'), oil('C', 'proposed')] })).toBe('the review as a whole');
    expect(decisionSubject({ oils: [] })).toBe('the review as a whole');
    expect(decisionLine({ decision: 'not-approved' }, { oils: [] })).toBe('Not approved: the review as a whole');
  });
  it('dates read as ISO 8601 (ISO 8601-1:2019 date and time of day)', () => {
    expect(isoDateTime('2026-12-02T07:30:12.345Z')).toBe('2026-12-02 07:30 UTC');
    expect(isoDateTime('2026-12-02T08:30:00+01:00')).toBe('2026-12-02 08:30 +01:00');
    expect(isoDateTime('yesterday')).toBe('yesterday');
  });
});
