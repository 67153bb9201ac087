// The approval of a version in words, bound to its number.
import { describe, expect, it } from 'vitest';
import { formatDate } from '../../teams/utils/formatDate.js';
import { approvalLine } from './approvalLine.js';

const nameOf = (login: string): string => (login === 'caspar' ? 'Caspar Iyengar' : login);

describe('approvalLine', () => {
  it('names the version, the approver and the date of an approval', () => {
    const at = '2026-12-03T17:04:00.000Z';
    expect(approvalLine({ number: 3, status: 'approved', approvedBy: 'caspar', approvedAt: at }, nameOf)).toBe(`Approved v3 by Caspar Iyengar, ${formatDate(at)}`);
  });

  it('says a later version is not approved', () => {
    expect(approvalLine({ number: 4, status: 'draft', approvedBy: null, approvedAt: null }, nameOf)).toBe('v4 is a draft, not approved');
    expect(approvalLine({ number: 4, status: 'in_review', approvedBy: null, approvedAt: null }, nameOf)).toBe('v4 is in review, not approved yet');
  });
});
