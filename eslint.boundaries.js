import { existsSync, readFileSync, readdirSync } from 'node:fs'
import { dirname, join, relative, resolve } from 'node:path'
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

const SPECIFIERS = /\bfrom\s+['"]([^'"]+)['"]|\bimport\s*\(?\s*['"]([^'"]+)['"]/g

const filesUnder = (dir) =>
  readdirSync(dir, { withFileTypes: true })
    .sort((a, b) => (a.name < b.name ? -1 : 1))
    .flatMap((d) => (d.isDirectory() ? filesUnder(join(dir, d.name)) : /\.tsx?$/.test(d.name) ? [join(dir, d.name)] : []))

/**
 * Which server module imports which (type imports count: they still depend on the other's
 * contract), each step with the first file that takes it: Map<from, Map<to, "from/file.ts">>.
 * Lint's no-cycle sees files only, and modules can form a cycle through files that do not.
 */
export function moduleImports(root) {
  const modulesDir = join(root, 'server/modules')
  const graph = new Map()
  for (const name of folders(modulesDir).sort()) {
    const edges = new Map()
    graph.set(name, edges)
    for (const file of filesUnder(join(modulesDir, name))) {
      for (const [, from, bare] of readFileSync(file, 'utf8').matchAll(SPECIFIERS)) {
        const spec = from ?? bare
        const target = spec.startsWith('.') ? resolve(dirname(file), spec) : spec.startsWith('#server/') ? join(root, 'server', spec.slice(8)) : null
        if (!target) continue
        const [other, ...rest] = relative(modulesDir, target).split(/[\\/]/)
        if (!rest.length || other === '..' || other === name || edges.has(other)) continue
        edges.set(other, relative(modulesDir, file).split(/[\\/]/).join('/'))
      }
    }
  }
  return graph
}

/**
 * The cycles in the graph of server modules, one per tangle (strongly connected set), written as
 * "a → b → a (via a/x.ts, b/y.ts)": the files name where to cut. Empty when modules form layers.
 */
export function moduleCycles(root) {
  const graph = moduleImports(root)
  const targets = (m) => [...(graph.get(m)?.keys() ?? [])].filter((t) => graph.has(t))
  // Tarjan's strongly connected components.
  const index = new Map()
  const low = new Map()
  const stack = []
  const tangles = []
  const visit = (m) => {
    index.set(m, index.size)
    low.set(m, index.get(m))
    stack.push(m)
    for (const t of targets(m)) {
      if (!index.has(t)) {
        visit(t)
        low.set(m, Math.min(low.get(m), low.get(t)))
      } else if (stack.includes(t)) low.set(m, Math.min(low.get(m), index.get(t)))
    }
    if (low.get(m) !== index.get(m)) return
    const tangle = []
    let t
    do {
      t = stack.pop()
      tangle.push(t)
    } while (t !== m)
    if (tangle.length > 1) tangles.push(tangle.sort())
  }
  for (const m of graph.keys()) if (!index.has(m)) visit(m)
  // The shortest way round each tangle from its first module, found breadth first.
  return tangles.map((tangle) => {
    const start = tangle[0]
    const cameFrom = new Map()
    const queue = [start]
    while (queue.length) {
      const m = queue.shift()
      for (const t of targets(m).filter((x) => tangle.includes(x))) {
        if (cameFrom.has(t)) continue
        cameFrom.set(t, m)
        queue.push(t)
      }
      if (cameFrom.has(start)) break
    }
    const path = [start]
    for (let m = cameFrom.get(start); m !== start; m = cameFrom.get(m)) path.unshift(m)
    path.unshift(start)
    const via = path.slice(0, -1).map((m, i) => graph.get(m).get(path[i + 1]))
    return `${path.join(' → ')} (via ${via.join(', ')})`
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
