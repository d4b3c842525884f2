import { describe, expect, it } from 'vitest';
import { checkedField, checkingKit, mustBe } from '../../../src/physics/check/kit';

const KIT = checkingKit((v) => (typeof v === 'string' ? JSON.stringify(v) : Array.isArray(v) ? `a list of ${v.length}` : String(v)));

describe('the checking kit', () => {
  it('words every failure as "<field> must be <expected>, got <value>"', () => {
    expect(mustBe('spanM', 'a finite number > 0', '-2')).toBe('spanM must be a finite number > 0, got -2');
    expect(() => KIT.positive('spanM', -2)).toThrow(new RangeError('spanM must be a finite number > 0, got -2'));
    expect(() => KIT.nonNegative('gapM', -0.5)).toThrow('gapM must be a finite number ≥ 0, got -0.5');
    expect(() => KIT.finite('zM', Number.POSITIVE_INFINITY)).toThrow('zM must be a finite number, got Infinity');
    expect(() => KIT.integer('bladeCount', 2.5, 1)).toThrow('bladeCount must be a whole number ≥ 1, got 2.5');
    expect(() => KIT.oneOf('axis', 'diagonal', ['strong', 'weak'])).toThrow('axis must be one of "strong", "weak", got "diagonal"');
    expect(() => KIT.range('ratio', 0.5, 0, 0.5, false, 'from 0 to below 0.5')).toThrow('ratio must be from 0 to below 0.5, got 0.5');
    expect(() => KIT.arrayOf('modes', [], 1, 'an array with at least 1 entry')).toThrow('modes must be an array with at least 1 entry, got a list of 0');
  });

  it('passes good values through unchanged and accepts typed arrays as lists', () => {
    expect(KIT.positive('spanM', 2)).toBe(2);
    expect(KIT.range('ratio', 0.5, 0, 0.5, true, 'from 0 to 0.5')).toBe(0.5);
    expect(KIT.arrayOf('zM', new Float64Array(3), 2, 'a list').length).toBe(3);
    expect(KIT.optional('gapM', undefined, KIT.positive)).toBeUndefined();
  });

  it('carries the field path on its error so a form can place the message', () => {
    let caught: unknown;
    try {
      KIT.positive('segments[0].section.widthM', 0);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(RangeError);
    expect(checkedField(caught)).toBe('segments[0].section.widthM');
    expect(checkedField(new RangeError('other'))).toBeUndefined();
  });
});
