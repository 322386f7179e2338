import { saleOrReturnAges } from '@/shared/money';

describe('saleOrReturnAges (VAT Act 1994 s.6(2)(c), HMRC VRS9150: supplied 12 months after sending)', () => {
  const lines = [
    { id: 1, dispatchDate: '2024-01-15', endDate: null },
    { id: 2, dispatchDate: '2024-10-01', endDate: null },
    { id: 3, dispatchDate: '2023-11-01', endDate: null },
    { id: 4, dispatchDate: '2023-06-01', endDate: '2024-01-10' }, // returned
    { id: 5, dispatchDate: null, endDate: null }, // not sent
  ];

  it('flags lines approaching and past 12 months out, most urgent first', () => {
    const ages = saleOrReturnAges(lines, '2024-11-20');
    expect(ages.map((a) => [a.id, a.status, a.deemedSupplyDate, a.daysLeft])).toEqual([
      [3, 'past', '2024-11-01', -19],
      [1, 'approaching', '2025-01-15', 56],
      [2, 'in-time', '2025-10-01', 315],
    ]);
  });

  it('counts the deemed supply from its day: on 15 Jan 2025 line 1 is past', () => {
    expect(saleOrReturnAges(lines, '2025-01-15').find((a) => a.id === 1)?.status).toBe('past');
    expect(saleOrReturnAges(lines, '2025-01-14').find((a) => a.id === 1)?.status).toBe(
      'approaching',
    );
  });

  it('takes 12 months from 29 Feb to 28 Feb: with no corresponding day, the month’s last (Dodds v Walker [1981])', () => {
    const [age] = saleOrReturnAges(
      [{ id: 9, dispatchDate: '2024-02-29', endDate: null }],
      '2024-03-01',
    );
    expect(age?.deemedSupplyDate).toBe('2025-02-28');
    expect(age?.daysLeft).toBe(364);
  });

  it('uses the warning window given', () => {
    expect(saleOrReturnAges(lines, '2024-11-20', 30).find((a) => a.id === 1)?.status).toBe(
      'in-time',
    );
  });
});
