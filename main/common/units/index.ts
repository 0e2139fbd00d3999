/**
 * The one unit module: quantity kinds, unit systems (SI kN/m/mm, US kip/ft/in), exact conversion
 * factors and one precision rule per kind. The app, the CLI, the schedule and the reports format
 * through it; the project file and the solver stay in SI. Parsing typed quantities with units
 * lives in the renderer (mathjs, renderer/units/parse-quantity.ts).
 */
export * from './unit-factors.ts';
export * from './quantity-kinds.ts';
export * from './format-quantity.ts';
export * from './message-quantity.ts';
