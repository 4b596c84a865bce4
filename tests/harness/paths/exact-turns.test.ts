import { exactTurns } from '../../../harness/paths/exact-turns';
import { parseTurns } from '../../../harness/paths/parse-turns';

describe('exactTurns', () => {
  it.each([
    ['pi', '1/2'],
    ['-pi/2', '-1/4'],
    ['3pi/4', '3/8'],
    ['0.5*pi', '1/4'],
    [' 2 * pi / 3 ', '1/3'],
  ])('reads %s as exactly %s turn, which parseTurns rounds to the nearest double', (angle, turns) => {
    const exact = exactTurns(angle);
    expect(exact?.toString()).toBe(turns);
    expect(parseTurns(angle)).toBe(Number(exact!.num) / Number(exact!.den));
  });

  it('gives null for an angle in radians, which no rational number of turns holds', () => {
    expect(exactTurns('1.5707963267948966')).toBeNull();
    expect(exactTurns('0')).toBeNull();
  });

  it('refuses a multiple of π divided by zero, naming the field', () => {
    expect(() => exactTurns('pi/0', 'start_angle')).toThrow('start_angle: "pi/0" divides by zero');
  });
});
