import type { Linter } from 'eslint'

/** Types for eslint.boundaries.js, which ESLint loads as plain JavaScript. */
export function boundaryConfig(options: { root: string; allowedEntityImports?: Record<string, string[]> }): Linter.Config[]
export function staleEntityImports(root: string, allowedEntityImports: Record<string, string[]>): string[]
/** Which server module imports which, each step with the first file that takes it (module → module → "module/file.ts"). */
export function moduleImports(root: string): Map<string, Map<string, string>>
/** The cycles in the graph of server modules, e.g. "a → b → a (via a/x.ts, b/y.ts)"; empty when modules form layers. */
export function moduleCycles(root: string): string[]
