import { findSizeRow } from './find-size-row';
import { isoGrades, shaftLetters, standardToleranceRows, type IsoGrade, type ShaftLetter } from './iso286-tables';

/** A hole-basis ISO 286 fit, as parsed from text such as "10 H7/g6". */
export interface IsoFit {
  /** Nominal size in mm (over 3 up to and including 50). */
  readonly size: number;
  /** Grade of the H hole, 6 to 11. */
  readonly holeGrade: IsoGrade;
  /** Shaft letter, 'c' to 'h'. */
  readonly shaftLetter: ShaftLetter;
  /** Grade of the shaft, 6 to 11. */
  readonly shaftGrade: IsoGrade;
}

// Size, optional "mm", hole letters + grade, slash, shaft letters + grade; spaces allowed between parts.
// Letters are matched loosely here so that a wrong letter gets its own message instead of "malformed".
const FIT_PATTERN = /^(\d+(?:\.\d+)?)\s*(?:mm)?\s*([A-Za-z]+)\s*(\d+)\s*\/\s*([A-Za-z]+)\s*(\d+)$/;
const HOW_TO = 'write the size in mm, then the hole and the shaft, as in "10 H7/g6"';

/**
 * Reads an ISO 286 hole-basis fit from text. Spaces are optional around each part ("10H7/g6",
 * " 10 H7 / g6 ", "10 mm H7/g6"); case is not, because ISO uses it to tell holes (capitals) from shafts.
 *
 * @param text - the fit, e.g. "10 H7/g6": size in mm, an H hole grade 6–11, a shaft c–h grade 6–11
 * @returns the size and the hole and shaft parts
 * @throws SyntaxError when the text is not shaped like a fit; RangeError, with the numbers, when a part is
 *   outside what is held here (other hole letters, shafts outside c–h, grades outside 6–11, sizes outside 3–50 mm)
 * @example
 * parseIsoFit('10 H7/g6'); // { size: 10, holeGrade: 7, shaftLetter: 'g', shaftGrade: 6 }
 */
export function parseIsoFit(text: string): IsoFit {
  const trimmed = String(text).trim();
  if (trimmed === '') throw new SyntaxError(`the ISO fit is empty: ${HOW_TO}`);
  const match = FIT_PATTERN.exec(trimmed);
  if (!match) throw new SyntaxError(`"${trimmed}" is not an ISO fit: ${whatIsWrong(trimmed)}`);
  const [, sizeText = '', holeText = '', holeGradeText = '', shaftText = '', shaftGradeText = ''] = match;

  if (holeText !== 'H') {
    throw new RangeError(
      holeText === 'h'
        ? `hole letters are capitals: write "H${holeGradeText}", not "h${holeGradeText}"`
        : `hole "${holeText}${holeGradeText}" is not held here: only H holes are (hole-basis fits), as in "10 H7/g6"`,
    );
  }
  const shaftLetter = readShaftLetter(shaftText, shaftGradeText);
  const holeGrade = readGrade(holeGradeText, `H${holeGradeText}`);
  const shaftGrade = readGrade(shaftGradeText, `${shaftText}${shaftGradeText}`);
  const size = Number(sizeText);
  // Checked here, not only later, so that a parsed fit is always one the tables can answer.
  findSizeRow(standardToleranceRows, size);
  return { size, holeGrade, shaftLetter, shaftGrade };
}

function whatIsWrong(text: string): string {
  if (!/^\d/.test(text)) return `it has no size in front; ${HOW_TO}`;
  if (!text.includes('/')) return `it needs a hole and a shaft separated by "/"; ${HOW_TO}`;
  return HOW_TO;
}

function readShaftLetter(letters: string, grade: string): ShaftLetter {
  const known = shaftLetters as readonly string[];
  if (known.includes(letters)) return letters as ShaftLetter;
  if (known.includes(letters.toLowerCase())) {
    throw new RangeError(
      `shaft letters are lower case: write "${letters.toLowerCase()}${grade}", not "${letters}${grade}"`,
    );
  }
  throw new RangeError(
    `shaft "${letters}${grade}" is not held here: only c, d, e, f, g and h shafts are (clearance fits)`,
  );
}

function readGrade(digits: string, part: string): IsoGrade {
  const grade = Number(digits);
  if (!(isoGrades as readonly number[]).includes(grade)) {
    throw new RangeError(`grade ${digits} in "${part}" is not held here: grades 6 to 11 are`);
  }
  return grade as IsoGrade;
}
