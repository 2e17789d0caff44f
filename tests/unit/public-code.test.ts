import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

// What a page pulls in before it can draw is the closure of its static imports (`import()` makes a
// chunk of its own). These walk that closure in the source, so a public page that starts to reach
// staff code, or an entry that grows a view or a heavy library, fails here and not in a phone's wait.
const root = path.resolve(import.meta.dirname, '../..');
const STATIC_IMPORT = /^\s*import\s+(?!type\b)(?:[^'"]*?\sfrom\s+)?['"]([^'"]+)['"]/gm;

function resolve(from: string, spec: string): string | null {
  let base: string;
  if (spec.startsWith('@/')) base = path.join(root, 'src', spec.slice(2));
  else if (spec.startsWith('@shared/')) base = path.join(root, 'shared', spec.slice(8));
  else if (spec.startsWith('.')) base = path.resolve(path.dirname(from), spec);
  else return null;
  base = base.replace(/\.js$/, '');
  for (const candidate of [base, `${base}.ts`, `${base}.vue`, path.join(base, 'index.ts')]) {
    if (existsSync(candidate) && statSync(candidate).isFile()) return candidate;
  }
  throw new Error(`${path.relative(root, from)}: cannot resolve ${spec}`);
}

/** The files and the packages a set of source files reaches through static imports. */
function closure(starts: string[]) {
  const files = new Set<string>();
  const packages = new Set<string>();
  const queue = [...starts];
  while (queue.length) {
    const file = queue.pop()!;
    if (files.has(file)) continue;
    files.add(file);
    if (!/\.(ts|vue)$/.test(file)) continue;
    for (const [, spec] of readFileSync(file, 'utf8').matchAll(STATIC_IMPORT)) {
      const target = resolve(file, spec!);
      if (target) queue.push(target);
      else packages.add(spec!);
    }
  }
  return { files: [...files].map((f) => path.relative(root, f)), packages: [...packages] };
}

const sourcesIn = (dir: string) => readdirSync(path.join(root, dir)).filter((f) => /\.(ts|vue)$/.test(f)).map((f) => path.join(root, dir, f));
const HEAVY = /^(leaflet|leaflet\.markercluster|@vue-leaflet\/|@geoman-io\/|@tiptap\/|chart\.js|papaparse|exifr|primevue\/(datatable|datepicker|editor|select|multiselect|inputnumber|dialog|menu|drawer|fileupload|chart)$)/;

describe('the code a page needs before it draws', () => {
  it('keeps the entry (main, App, router) to the public landing page, free of other views and heavy libraries', () => {
    const { files, packages } = closure([path.join(root, 'src/main.ts')]);
    const landing = ['src/views/visit/VisitLayout.vue', 'src/views/visit/VisitHomeView.vue'];
    expect(files.filter((f) => f.startsWith('src/views/') && !landing.includes(f))).toEqual([]);
    expect(packages.filter((p) => HEAVY.test(p) || p === 'zod')).toEqual([]);
  });

  it('keeps the public pages free of staff screens, staff components and heavy libraries', () => {
    const { files, packages } = closure([...sourcesIn('src/views/visit'), ...sourcesIn('src/components/visit')]);
    expect(files.filter((f) => f.startsWith('src/views/') && !f.startsWith('src/views/visit/'))).toEqual([]);
    expect(files.filter((f) => /src\/(components\/(Deck|Condition|Risk|Media|RichText|Compartment|Artifact|Incident|RepairProject|People)|stores\/)/.test(f))).toEqual([]);
    expect(packages.filter((p) => HEAVY.test(p))).toEqual([]);
  });

  it('finds the design tokens of every PrimeVue component a public page uses in the entry theme', () => {
    const { packages } = closure([...sourcesIn('src/views/visit'), ...sourcesIn('src/components/visit')]);
    const used = packages.filter((p) => /^primevue\/[a-z]+$/.test(p) && !/^primevue\/use/.test(p)).map((p) => p.slice('primevue/'.length));
    expect(used.length).toBeGreaterThan(0);
    // read from the source: the client's files are outside this (node) project
    const list = /PUBLIC_COMPONENT_TOKENS = \{([^}]*)\}/.exec(readFileSync(path.join(root, 'src/theme.ts'), 'utf8'))![1]!;
    const withTokens = list.split(',').map((name) => name.trim());
    expect(used.filter((name) => !withTokens.includes(name))).toEqual([]);
  });

  it('sees an import it should refuse (the walk itself works)', () => {
    const staff = closure([path.join(root, 'src/views/staff/ShipMapView.vue')]);
    expect(staff.packages.some((p) => HEAVY.test(p))).toBe(true);
    expect(staff.files).toContain('src/components/DeckMap.vue');
  });
});
