import { describe, expect, it } from 'vitest';
import { cssString, pageRule } from '../../../src/ui/report/print-header';
import { inputRows } from '../../../src/ui/report/report-inputs';
import { FORMS } from '../../../src/kinds/registry';

describe('running header of the printed record', () => {
  it('a case name with quotes, backslashes or line breaks cannot break out of the CSS string', () => {
    expect(cssString('Pile "P7" \\ east\nberth')).toBe('"Pile \\"P7\\" \\\\ east berth"');
    expect(cssString('x"; } body { display: none')).toBe('"x\\"; } body { display: none"');
  });

  it('the page rule carries the header, page n of N and the screening caution', () => {
    const rule = pageRule('Berth 3 · P7', '0.2.0');
    expect(rule).toContain('@top-left { content: "Berth 3 · P7"');
    expect(rule).toContain('counter(page) " of " counter(pages)');
    expect(rule).toContain('not a design approval');
  });
});

describe('inputs in the printed record', () => {
  it('each input shows its SI value and whether it was entered or left at its default', () => {
    const form = FORMS.pile;
    const values = { ...form.defaults('si'), outerDiameter: '30 in' };
    const rows = inputRows(form.fields, values, 'si', form.defaults('si'));
    const od = rows.find((r) => r.key === 'outerDiameter')!;
    // 30 in = 762 mm exactly (NIST SP 811: 1 in = 25.4 mm).
    expect(od.si).toBe('762 mm');
    expect(od.isDefault).toBe(false);
    const wall = rows.find((r) => r.key === 'wallThickness')!;
    expect(wall.isDefault).toBe(true);
    expect(wall.si).toBe('12 mm');
  });
});
