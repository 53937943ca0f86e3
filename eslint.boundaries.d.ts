import type { Linter } from 'eslint'

/** Types for eslint.boundaries.js, which ESLint loads as plain JavaScript. */
export function boundaryConfig(options: { root: string; allowedEntityImports?: Record<string, string[]> }): Linter.Config[]
export function staleEntityImports(root: string, allowedEntityImports: Record<string, string[]>): string[]
