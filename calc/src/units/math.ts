import { all, create, type MathJsInstance } from 'mathjs';

/**
 * The one mathjs instance of the core. Custom units are added here once (mathjs has no rpm).
 */
// mathjs declares its factory sets as entries of a string record, so the type allows undefined.
if (!all) throw new Error('mathjs exports no "all" factory set');
export const math: MathJsInstance = create(all, {});

math.createUnit('rpm', { definition: `${Math.PI / 30} rad/s`, aliases: ['rev/min'] });
