import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isoFitClearance, isoGrades, shaftLetters } from '../../../shared/fit/index';

describe('isoFitClearance', () => {
  it('gives 5–29 µm and the limits when the fit is 10 H7/g6', () => {
    const fit = isoFitClearance('10 H7/g6');
    expect(fit.hole).toEqual({ upper: 15, lower: 0 }); // torqyx.vercel.app/standards/fits: "10 mm: H7 0/+15 µm"
    expect(fit.shaft).toEqual({ upper: -5, lower: -14 }); // torqyx.vercel.app/standards/fits: "g6 −14/−5 µm"
    expect(fit.minClearanceUm).toBe(5); // derived, REFERENCES §1.3 from torqyx limits
    expect(fit.maxClearanceUm).toBe(29); // derived, REFERENCES §1.3 from torqyx limits (machinecalcs' 28 is a known pitfall)
    expect(fit.size).toBe(10);
  });

  it('gives the published clearance range when the fit is a worked example', () => {
    const range = (text: string) => {
      const fit = isoFitClearance(text);
      return [fit.minClearanceUm, fit.maxClearanceUm];
    };
    expect(range('20 H8/f7')).toEqual([20, 74]); // derived from Machine Drawing Table 15.1 + Coban Engineering; machinecalcs.com/iso-286-fit-table gives 20–74 for 25 mm (same range)
    expect(range('10 H11/c11')).toEqual([80, 260]); // derived from Machine Drawing Table 15.1 + Coban Engineering
    expect(range('25 H7/h6')).toEqual([0, 34]); // machinecalcs.com/iso-286-fit-table; qpoe FAQ page "0.000 … 0.034 mm"
    expect(range('25 H7/g6')).toEqual([7, 41]); // machinecalcs.com/iso-286-fit-table: "25H7/g6 … 0.007–0.041 mm"
    expect(range('50 H9/d9')).toEqual([80, 204]); // machinecalcs.com/iso-286-fit-table
    expect(range('6 H7/g6')).toEqual([4, 24]); // derived, REFERENCES §1.3
    expect(range('10 H8/f7')).toEqual([13, 50]); // derived, REFERENCES §1.3
    expect(range('40 H11/c11')).toEqual([120, 440]); // derived, REFERENCES §1.3
    expect(range('10 H9/d9')).toEqual([40, 112]); // derived, REFERENCES "Known pitfalls" (not machinecalcs' 39–111)
  });

  it('names the fit from the preferred list when the fit is preferred', () => {
    // ISO 286-1:2010 / ANSI B4.2-1978 preferred fits, via amesweb.info/FitTolerance/PreferredTolerances.aspx
    expect(isoFitClearance('10 H7/g6').name).toBe('sliding'); // amesweb.info preferred fits
    expect(isoFitClearance('20 H8/f7').name).toBe('close running'); // amesweb.info preferred fits
    expect(isoFitClearance('10 H11/c11').name).toBe('loose running'); // amesweb.info preferred fits
    expect(isoFitClearance('50 H9/d9').name).toBe('free running'); // amesweb.info preferred fits
    expect(isoFitClearance('25 H7/h6').name).toBe('locational clearance'); // amesweb.info preferred fits
    expect(isoFitClearance('25 H7/h6').preferred).toBe(true);
  });

  it('calls the fit "clearance" when it is not on the preferred list', () => {
    const fit = isoFitClearance('10 H8/e8');
    expect(fit.name).toBe('clearance');
    expect(fit.preferred).toBe(false);
  });

  it('never gives a negative clearance when the shaft is c to h', () => {
    // Clearance fits by construction: EI = 0 and es ≤ 0 (REFERENCES §1.2).
    fc.assert(
      fc.property(
        fc.integer({ min: 4, max: 50 }),
        fc.constantFrom(...isoGrades),
        fc.constantFrom(...shaftLetters),
        fc.constantFrom(...isoGrades),
        (size, holeGrade, letter, shaftGrade) => {
          const fit = isoFitClearance(`${size} H${holeGrade}/${letter}${shaftGrade}`);
          expect(fit.minClearanceUm).toBeGreaterThanOrEqual(0);
          expect(fit.maxClearanceUm).toBeGreaterThan(fit.minClearanceUm);
        },
      ),
    );
  });

  it('throws a clear error when the text is not a fit held here', () => {
    expect(() => isoFitClearance('10 X7/g6')).toThrow(/hole "X7"/);
    expect(() => isoFitClearance('H7/g6')).toThrow(/no size/);
    expect(() => isoFitClearance('')).toThrow(/empty/);
    expect(() => isoFitClearance('55 H7/g6')).toThrow(/55 mm/);
  });
});
