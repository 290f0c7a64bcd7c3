import type {Operand, WhereExpression, WhereNode} from './ast.js';

/** Column names an expression reads, once each, in order of appearance (for checks before loading). */
export function whereColumns(expression: WhereExpression): string[] {
  const names = new Set<string>();
  const addOperand = (operand: Operand): void => {
    if (operand.kind === 'column') names.add(operand.name);
  };
  const visit = (node: WhereNode): void => {
    switch (node.kind) {
      case 'compare':
        addOperand(node.left);
        addOperand(node.right);
        return;
      case 'in':
        addOperand(node.subject);
        return;
      case 'not':
        visit(node.operand);
        return;
      case 'and':
      case 'or':
        visit(node.left);
        visit(node.right);
    }
  };
  visit(expression.root);
  return [...names];
}
