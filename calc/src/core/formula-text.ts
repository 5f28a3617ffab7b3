import type { MathNode } from 'mathjs';

/** A formula rendered as text pieces; `{ symbol }` pieces are filled with names or values. */
export type TextPiece = string | { symbol: string };

const FUNCTION_TEXT: Record<string, string> = { sqrt: '√', log: 'ln' };
const CONSTANTS: Record<string, string> = { pi: 'π', e: 'e' };
const OPERATOR_TEXT: Record<string, string> = { '*': ' · ', '/': ' / ', '+': ' + ', '-': ' − ' };
const SUPERSCRIPTS: Record<string, string> = { '2': '²', '3': '³', '4': '⁴' };

interface AnyNode {
  type: string;
  name?: string;
  op?: string;
  fn?: string | { name: string };
  args?: AnyNode[];
  content?: AnyNode;
  value?: unknown;
}

/**
 * Renders a parsed mathjs expression into text pieces: '·' for products, '²' '³' '⁴' for powers, '√'
 * for roots, 'π' for pi, and a placeholder for every symbol of `symbols`. Parentheses are kept
 * where the expression has them, so write definitions with the grouping you want printed.
 */
export function renderPieces(node: MathNode, symbols: ReadonlySet<string>): TextPiece[] {
  const out: TextPiece[] = [];
  const walk = (n: AnyNode): void => {
    switch (n.type) {
      case 'SymbolNode': {
        const name = n.name ?? '';
        if (symbols.has(name)) out.push({ symbol: name });
        else out.push(CONSTANTS[name] ?? name);
        return;
      }
      case 'ConstantNode':
        out.push(String(n.value));
        return;
      case 'ParenthesisNode': {
        const inner = n.content as AnyNode;
        // (−expm1(x)) prints (1 − e^(x)) once, not ((1 − e^(x))).
        if (inner.type === 'OperatorNode' && inner.op === '-' && inner.args?.length === 1) {
          if (isExpm1(argOf(inner, 0))) {
            walk(inner);
            return;
          }
        }
        out.push('(');
        walk(inner);
        out.push(')');
        return;
      }
      case 'OperatorNode': {
        const args = n.args ?? [];
        const op = n.op ?? '';
        if (args.length === 1) {
          // −expm1(x) is written as the mathematics it computes: (1 − e^(x)).
          const inner = argOf(n, 0);
          if (op === '-' && isExpm1(inner)) {
            out.push('(1 − e^(');
            walk(argOf(inner, 0));
            out.push('))');
            return;
          }
          out.push(op === '-' ? '−' : op);
          walk(inner);
          return;
        }
        if (op === '^') {
          walk(argOf(n, 0));
          const exp = argOf(n, 1);
          const sup = exp.type === 'ConstantNode' ? SUPERSCRIPTS[String(exp.value)] : undefined;
          if (sup) out.push(sup);
          else {
            out.push('^');
            walk(exp);
          }
          return;
        }
        walk(argOf(n, 0));
        out.push(OPERATOR_TEXT[op] ?? ` ${op} `);
        walk(argOf(n, 1));
        return;
      }
      case 'FunctionNode': {
        const name = typeof n.fn === 'string' ? n.fn : (n.fn?.name ?? '');
        const args = n.args ?? [];
        // expm1 is a software function (e^x − 1 without cancellation): print the mathematics.
        if (isExpm1(n)) {
          out.push('(e^(');
          walk(argOf(n, 0));
          out.push(') − 1)');
          return;
        }
        if (name === 'exp' && args.length === 1) {
          out.push('e^(');
          walk(argOf(n, 0));
          out.push(')');
          return;
        }
        out.push(`${FUNCTION_TEXT[name] ?? name}(`);
        args.forEach((a, i) => {
          if (i > 0) out.push(', ');
          walk(a);
        });
        out.push(')');
        return;
      }
      default:
        throw new Error(`formula-text: unsupported expression node ${n.type}`);
    }
  };
  walk(node as unknown as AnyNode);
  return mergeStrings(out);
}

/** An operand of a parsed node; mathjs gives operators and calls theirs, so a miss is a fault. */
function argOf(n: AnyNode, i: number): AnyNode {
  const a = n.args?.[i];
  if (!a) throw new Error(`formula-text: ${n.type} ${n.op ?? ''} has no operand ${i + 1}`);
  return a;
}

function isExpm1(n: AnyNode): boolean {
  const name = typeof n.fn === 'string' ? n.fn : n.fn?.name;
  return n.type === 'FunctionNode' && name === 'expm1' && n.args?.length === 1;
}

function mergeStrings(pieces: TextPiece[]): TextPiece[] {
  const merged: TextPiece[] = [];
  for (const piece of pieces) {
    const last = merged[merged.length - 1];
    if (typeof piece === 'string' && typeof last === 'string')
      merged[merged.length - 1] = last + piece;
    else merged.push(piece);
  }
  return merged;
}

/** Collects the free symbol names of an expression (excluding function names). */
export function symbolNames(node: MathNode): Set<string> {
  const names = new Set<string>();
  node.traverse((n, _path, parent) => {
    const any = n as unknown as AnyNode;
    const p = parent as unknown as AnyNode | null;
    if (any.type === 'SymbolNode' && !(p?.type === 'FunctionNode' && (p.fn as unknown) === n)) {
      names.add(any.name ?? '');
    }
  });
  return names;
}
