/** Unit-aware entry and display (mathjs at the edge; the project file stays SI). */
export * from './quantity-kinds.ts';
export * from './parse-quantity.ts';
export * from './format-quantity.ts';
