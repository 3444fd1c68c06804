/**
 * The notation layer's public surface: LaTeX math and notary-block JSON matrices → expression
 * trees with exact source offsets; statement splitting; printing back to LaTeX and plain text.
 * It knows nothing of documents, the engine or editors.
 */
export type * from './ast';
export { splitStatements } from './statements';
export { parseNotaryLine, parseJsonMatrix, type NotaryLine } from './notary-line';
export { parseMathExpression, type ParsedExpression } from './parse';
export { symbolKey } from './symbols';
export { childrenOf, walkExpr, someExpr, stripPositions, exprEquals, treeDepth, maxTreeDepth } from './tree';
export { detectStyle, emptyStyle, type NotationStyle } from './style';
export { toLatex } from './print-latex';
export { toPlainText, toPlainTextLines } from './print-text';
export {
  formatMatrixLatex,
  formatMatrixJson,
  formatMatrixLines,
  formatMatrixPlainText,
  formatRational,
  formatDecimal,
  bracketsFor,
  type RationalFormat,
  type PlainBrackets,
} from './format';
