import { describe, expect, it } from 'vitest';
import { defineFormula, Derivation, CalcDomainError } from './step.js';
import { nearlyEqual } from '../testing/expect-close.js';

const torque = defineFormula({
  id: 'drum-torque',
  label: 'Brake torque (short shoe, two shoes)',
  symbol: 'M_b',
  expression: 'mu * N * D',
  symbols: {
    mu: { text: 'μ', dimension: 'dimensionless' },
    N: { text: 'N', dimension: 'force' },
    D: { text: 'D', dimension: 'length' },
  },
  dimension: 'torque',
  reference: 'definition',
});

describe('defineFormula', () => {
  it('computes, prints and substitutes from one definition', () => {
    const v = { mu: 0.35, N: 12400, D: 0.4 };
    expect(nearlyEqual(torque.evaluate(v), 1736, 1e-12)).toBe(true);
    expect(torque.text).toBe('M_b = μ · N · D');
    expect(torque.substitute(v)).toBe('M_b = 0.35 · 12.4 kN · 400.0 mm');
  });

  it('prints squares, roots, trig and pi', () => {
    const f = defineFormula({
      id: 'x',
      label: 'x',
      symbol: 'a',
      expression: '4 * r * sin(t2) / (2 * t2 + sin(2 * t2)) + sqrt(J) * pi * w^2',
      symbols: {
        r: { text: 'r', dimension: 'length' },
        t2: { text: 'θ₂', dimension: 'angle' },
        J: { text: 'J', dimension: 'inertia' },
        w: { text: 'ω', dimension: 'angularSpeed' },
      },
      dimension: 'length',
      reference: 'x',
    });
    expect(f.text).toBe('a = 4 · r · sin(θ₂) / (2 · θ₂ + sin(2 · θ₂)) + √(J) · π · ω²');
    expect(f.substitute({ r: 0.25, t2: Math.PI / 3, J: 4, w: 2 })).toContain('250.0 mm');
    // A power applies to the value with its unit: (2.000 rad/s)², never 2.000 rad/s².
    expect(f.substitute({ r: 0.25, t2: Math.PI / 3, J: 4, w: 2 })).toContain('(2.000 rad/s)²');
  });

  it('prints a symbol used twice the same way, wrapping only where a power follows', () => {
    const f = defineFormula({
      id: 'twice',
      label: 'twice',
      symbol: 'V',
      expression: 'a * a^2 + b',
      symbols: {
        a: { text: 'a', dimension: 'length' },
        b: { text: 'b', dimension: 'dimensionless' },
      },
      dimension: 'dimensionless',
      reference: 'x',
    });
    expect(f.substitute({ a: 0.15, b: 2 })).toBe('V = 150.0 mm · (150.0 mm)² + 2');
    expect(f.substitute({ a: -0.15, b: 2 })).toBe('V = (−150.0 mm) · (−150.0 mm)² + 2');
  });

  it('prints a fourth power as a superscript, around the whole quantity; other powers with ^', () => {
    const f = defineFormula({
      id: 'quartic',
      label: 'quartic',
      symbol: 'F',
      expression: 't^4 * t^5',
      symbols: { t: { text: 't', dimension: 'length' } },
      dimension: 'dimensionless',
      reference: 'x',
    });
    expect(f.text).toBe('F = t⁴ · t^5');
    expect(f.substitute({ t: 0.0015 })).toBe('F = (1.50 mm)⁴ · (1.50 mm)^5');
  });

  it('wraps negative substitutions in parentheses', () => {
    expect(torque.substitute({ mu: 0.35, N: -100, D: 0.4 })).toContain('(−100 N)');
  });

  it('rejects undeclared symbols at definition time', () => {
    expect(() =>
      defineFormula({
        id: 'bad',
        label: 'bad',
        symbol: 'y',
        expression: 'a * b',
        symbols: { a: { text: 'a', dimension: 'length' } } as never,
        dimension: 'length',
        reference: 'x',
      }),
    ).toThrow(/"b" is not declared/);
  });
});

describe('Derivation', () => {
  it('records steps in order with ids, sections and SI units', () => {
    const d = new Derivation('brake');
    const a = d.step(torque, { mu: 0.35, N: 12400, D: 0.4 }, { id: 'torque-nom' });
    d.step(
      torque,
      { mu: 0.25, N: 12400, D: 0.4 },
      { id: 'torque-min', section: 'friction', label: 'At μ min', symbol: 'M_b,min' },
    );
    expect(nearlyEqual(a, 1736, 1e-12)).toBe(true);
    expect(d.steps.map((s) => s.id)).toEqual(['torque-nom', 'torque-min']);
    expect(d.steps[0]).toMatchObject({
      section: 'brake',
      unit: 'N m',
      dimension: 'torque',
      reference: 'definition',
    });
    expect(d.steps[1].formula).toBe('M_b,min = μ · N · D');
    expect(d.steps[1].substituted.startsWith('M_b,min = 0.25 ·')).toBe(true);
    expect(d.steps[1].section).toBe('friction');
    expect(nearlyEqual(d.value('torque-min'), 1240, 1e-12)).toBe(true);
  });

  it('refuses duplicate ids and non-finite results', () => {
    const d = new Derivation();
    d.step(torque, { mu: 0.35, N: 1, D: 1 });
    expect(() => d.step(torque, { mu: 0.35, N: 1, D: 1 })).toThrow(/duplicate/);
    expect(() => d.step(torque, { mu: 0.35, N: Infinity, D: 1 }, { id: 'inf' })).toThrow(
      CalcDomainError,
    );
  });
});

describe('closure compilation matches mathjs', () => {
  it('evaluates like mathjs, and a declared symbol named e is not Euler’s number', async () => {
    const { math } = await import('../units/math.js');
    const f = defineFormula({
      id: 'c',
      label: 'c',
      symbol: 'y',
      expression: 'F + k * e * r ^ 2 / (1 - exp(-x)) + sin(x) * pi - sqrt(F) + -r',
      symbols: {
        F: { text: 'F', dimension: 'force' },
        k: { text: 'k', dimension: 'stiffness' },
        e: { text: 'ε', dimension: 'length' },
        r: { text: 'r', dimension: 'dimensionless' },
        x: { text: 'x', dimension: 'dimensionless' },
      },
      dimension: 'force',
      reference: 'x',
    });
    const scope = { F: 5000, k: 1e5, e: 0.001, r: 5, x: 0.7 };
    const expected = math.evaluate(f.spec.expression, { ...scope }) as number;
    expect(nearlyEqual(f.evaluate(scope), expected, 1e-12)).toBe(true);
  });
});

describe('a recorded step writes its substituted line when read', () => {
  const record = () => {
    const d = new Derivation('brake');
    d.step(torque, { mu: 0.35, N: 12400, D: 0.4 }, { symbol: 'M_b,min' });
    return d.steps[0];
  };
  const line = 'M_b,min = 0.35 · 12.4 kN · 400.0 mm';

  it('reads the same line as substitute() gives, every time', () => {
    const s = record();
    expect(s.substituted).toBe(line);
    expect(s.substituted).toBe(line);
  });

  it('keeps the line through JSON, structured clone and spreading, and nothing else', () => {
    const s = record();
    const keys = [
      'id',
      'section',
      'label',
      'symbol',
      'formula',
      'value',
      'unit',
      'dimension',
      'reference',
      'substituted',
    ];
    const json = JSON.parse(JSON.stringify(s)) as Record<string, unknown>;
    expect(Object.keys(json).sort()).toEqual([...keys].sort());
    expect(json.substituted).toBe(line);
    const clone = structuredClone(s) as unknown as Record<string | symbol, unknown>;
    expect(clone.substituted).toBe(line);
    expect(Object.getOwnPropertySymbols(clone)).toEqual([]);
    expect({ ...s }.substituted).toBe(line);
  });

  it('still reads the line from a deeply frozen step', () => {
    const s = record();
    const deepFreeze = (o: object) => {
      for (const k of Reflect.ownKeys(o)) {
        const d = Object.getOwnPropertyDescriptor(o, k);
        if (d && 'value' in d && typeof d.value === 'object' && d.value !== null)
          deepFreeze(d.value);
      }
      Object.freeze(o);
    };
    deepFreeze(s);
    expect(s.substituted).toBe(line);
  });
});
