import { existsSync, readFileSync, readdirSync } from 'node:fs'
import { join } from 'node:path'
import { createNodeResolver, importX } from 'eslint-plugin-import-x'

const folders = (dir) => {
  try {
    return readdirSync(dir, { withFileTypes: true })
      .filter((d) => d.isDirectory())
      .map((d) => d.name)
  } catch {
    return []
  }
}

/** Each feature may import only itself; it composes with others in src/app. */
function featureZones(root) {
  return folders(join(root, 'src/features')).map((name) => ({
    target: `src/features/${name}`,
    from: 'src/features',
    except: [`./${name}`],
    message: 'Features never import each other: compose them in src/app, or move what both need to src/api or src/lib.',
  }))
}

const ENTITY_FILES = /\.entit(y|ies)\.ts$/

/** A module reaches another module through its service API, never its entities (`*.entity.ts`, `*.entities.ts`). */
function moduleZones(root) {
  const modules = folders(join(root, 'server/modules'))
  const entitiesOf = (name) =>
    readdirSync(join(root, 'server/modules', name))
      .filter((f) => ENTITY_FILES.test(f))
      .map((f) => `server/modules/${name}/${f}`)
  return modules.flatMap((name) =>
    modules
      .filter((other) => other !== name)
      .flatMap(entitiesOf)
      .map((entity) => ({ target: `server/modules/${name}`, from: entity, message: 'Reach another module through its service API, not its entities.' })),
  )
}

/** Allowed entity imports that no longer happen, so their entries can go (a list of "file -> entity" lines). */
export function staleEntityImports(root, allowedEntityImports) {
  return Object.entries(allowedEntityImports).flatMap(([importer, entities]) => {
    const file = join(root, 'server/modules', importer)
    const text = existsSync(file) ? readFileSync(file, 'utf8') : ''
    return entities.filter((e) => !text.includes(`/${e.replace(/\.ts$/, '')}'`)).map((e) => `${importer} -> ${e}`)
  })
}

/**
 * The architecture's import rules as flat config, for the project (eslint.config.js) and for the lint test's fixture tree.
 * `allowedEntityImports` maps a module file to the other modules' entity files it may still read (paths under server/modules).
 * @param {{ root: string, allowedEntityImports?: Record<string, string[]> }} options
 */
export function boundaryConfig({ root, allowedEntityImports = {} }) {
  const zones = [
    ...featureZones(root),
    ...moduleZones(root),
    { target: 'shared', from: ['src', 'server'], message: 'shared/ is imported by both sides and imports neither.' },
    { target: 'src', from: 'server', message: 'The client never imports the server.' },
    {
      target: ['src/api', 'src/lib', 'src/components'],
      from: ['src/features', 'src/app'],
      message: 'Shared client layers sit below the features and the app.',
    },
  ]
  const restrict = (list) => ['error', { basePath: root, zones: list }]
  // The rule knows no per-file exception: an allowed importer gets the same zones minus its allowed entity files.
  const exemptions = Object.entries(allowedEntityImports).map(([importer, entities]) => ({
    files: [`server/modules/${importer}`],
    rules: { 'import-x/no-restricted-paths': restrict(zones.filter((z) => !entities.some((e) => z.from === `server/modules/${e}`))) },
  }))
  return [
    {
      files: ['**/*.{ts,tsx}'],
      plugins: { 'import-x': importX },
      settings: {
        'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.tsx', '.js'] })],
        // Without these the cycle check cannot read TypeScript files and quietly finds nothing.
        'import-x/extensions': ['.ts', '.tsx', '.js'],
        'import-x/parsers': { '@typescript-eslint/parser': ['.ts', '.tsx'] },
        'import-x/external-module-folders': ['node_modules'],
      },
      rules: {
        'import-x/no-cycle': ['error', { ignoreExternal: true }],
        'import-x/no-restricted-paths': restrict(zones),
      },
    },
    ...exemptions,
  ]
}
