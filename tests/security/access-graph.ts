// A small static call graph over the project's TypeScript, used by route-access.test.ts to prove that
// every route handler and server action reaches the one permission check (`can` in lib/permissions.ts).
// It follows plain function calls through local declarations, imports, re-exports and aliases, within
// the repository only (never node_modules). An approximation on the safe side of what matters here: a
// handler that never even calls a function that calls `can` certainly does not check access.
import { existsSync, readFileSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';

export const ROOT = path.resolve(import.meta.dirname, '..', '..');
export const HTTP_METHODS = ['GET', 'HEAD', 'POST', 'PUT', 'PATCH', 'DELETE', 'OPTIONS'] as const;

/** The one access-check function and the one pipeline factory, as "file#export". */
export const ACCESS_CHECK = 'lib/permissions.ts#can';
export const PIPELINE = 'lib/api/route.ts#route';

/**
 * The pipeline's factories, each of which makes its handler with route(): where the route's spec (an
 * object literal with `handler` and perhaps `auth`) or its handler function stands among the arguments,
 * and whether the factory itself checks access before the handler (ownedRoute loads its thing with
 * loadOwned): then the factory's own path to `can` counts for the handler.
 */
export const PIPELINE_FACTORIES: Record<string, { spec: number } | { handler: number }> = {
  [PIPELINE]: { spec: 0 },
  'lib/api/route.ts#ownedRoute': { spec: 2 },
  'lib/api/csv-import.ts#csvImportRoute': { handler: 1 },
};
const CHECKING_FACTORIES = new Set(['lib/api/route.ts#ownedRoute']);

type Decl = { file: string; name: string; node: ts.Node };

export type HandlerReport = {
  file: string;
  method: string;
  /** Created by the lib/api pipeline (`route({...})`). */
  viaPipeline: boolean;
  /** `auth: false` in its spec: open to people without a session. */
  public: boolean;
  /** Reaches `can` (the chain of calls that gets there, else null). */
  accessPath: string[] | null;
  problem?: string;
};

export class AccessGraph {
  private sources = new Map<string, ts.SourceFile | null>();

  /** `overlay` replaces or adds files (relative paths) for self-tests of the checker. */
  constructor(private overlay: Record<string, string> = {}) {}

  source(file: string): ts.SourceFile | null {
    if (this.sources.has(file)) return this.sources.get(file)!;
    const abs = path.join(ROOT, file);
    const text = this.overlay[file] ?? (existsSync(abs) ? readFileSync(abs, 'utf8') : null);
    const sf =
      text === null
        ? null
        : ts.createSourceFile(
            file,
            text,
            ts.ScriptTarget.Latest,
            true,
            file.endsWith('x') ? ts.ScriptKind.TSX : ts.ScriptKind.TS,
          );
    this.sources.set(file, sf);
    return sf;
  }

  private exists(file: string): boolean {
    if (file in this.overlay) return true;
    const abs = path.join(ROOT, file);
    return existsSync(abs) && statSync(abs).isFile();
  }

  /** A module specifier as a repository-relative file, or null for packages. */
  resolve(fromFile: string, spec: string): string | null {
    let base: string;
    if (spec.startsWith('@/')) base = spec.slice(2);
    else if (spec.startsWith('.')) base = path.posix.join(path.posix.dirname(fromFile), spec);
    else return null;
    for (const c of [`${base}.ts`, `${base}.tsx`, `${base}/index.ts`, `${base}/index.tsx`, base]) {
      if (this.exists(c)) return c;
    }
    return null;
  }

  /** The declaration a top-level name of `file` stands for, following imports and re-exports. */
  binding(file: string, name: string, seen = new Set<string>()): Decl | null {
    const key = `${file}#${name}`;
    if (seen.has(key)) return null;
    seen.add(key);
    const sf = this.source(file);
    if (!sf) return null;
    for (const st of sf.statements) {
      if (ts.isFunctionDeclaration(st) && st.name?.text === name) return { file, name, node: st };
      if (ts.isVariableStatement(st)) {
        for (const d of st.declarationList.declarations) {
          if (ts.isIdentifier(d.name) && d.name.text === name) return { file, name, node: d };
        }
      }
      if (ts.isImportDeclaration(st) && ts.isStringLiteral(st.moduleSpecifier)) {
        const clause = st.importClause;
        const target = this.resolve(file, st.moduleSpecifier.text);
        if (!clause || clause.isTypeOnly) continue;
        const bindings = clause.namedBindings;
        if (bindings && ts.isNamedImports(bindings)) {
          for (const el of bindings.elements) {
            if (el.name.text !== name || el.isTypeOnly) continue;
            if (!target) return { file: st.moduleSpecifier.text, name, node: el }; // a package
            return this.exported(target, (el.propertyName ?? el.name).text, seen);
          }
        }
        if (clause.name?.text === name) {
          return target ? this.exported(target, 'default', seen) : null;
        }
      }
    }
    return null;
  }

  /** The declaration behind `export ... name` of `file`. */
  exported(file: string, name: string, seen = new Set<string>()): Decl | null {
    const sf = this.source(file);
    if (!sf) return null;
    for (const st of sf.statements) {
      if (!ts.isExportDeclaration(st) || st.isTypeOnly) continue;
      const from =
        st.moduleSpecifier && ts.isStringLiteral(st.moduleSpecifier)
          ? this.resolve(file, st.moduleSpecifier.text)
          : undefined;
      if (st.exportClause && ts.isNamedExports(st.exportClause)) {
        for (const el of st.exportClause.elements) {
          if (el.name.text !== name) continue;
          const local = (el.propertyName ?? el.name).text;
          if (from) return this.exported(from, local, seen);
          return this.binding(file, local, seen);
        }
      } else if (!st.exportClause && from) {
        const found = this.exported(from, name, seen);
        if (found) return found;
      }
    }
    return this.binding(file, name, seen);
  }

  /**
   * The chain of calls from `node` (in `file`) to `can`, or null when none is found. Follows calls of
   * plain names (`allow(...)`, `designFor(...)`) and names passed as arguments (`.then(check)`) into
   * their declarations, up to `depth` levels.
   */
  reachesAccessCheck(file: string, node: ts.Node, depth = 6, visiting = new Set<string>()): string[] | null {
    let found: string[] | null = null;
    const visit = (n: ts.Node): void => {
      if (found) return;
      const names: ts.Identifier[] = [];
      if (ts.isCallExpression(n) || ts.isNewExpression(n)) {
        if (ts.isIdentifier(n.expression)) names.push(n.expression);
        for (const a of n.arguments ?? []) if (ts.isIdentifier(a)) names.push(a);
      }
      for (const id of names) {
        const decl = this.binding(file, id.text);
        if (!decl) continue;
        const key = `${decl.file}#${decl.name}`;
        if (key === ACCESS_CHECK) {
          found = [key];
          return;
        }
        if (depth <= 0 || visiting.has(key) || !decl.file.includes('.ts')) continue;
        visiting.add(key);
        const rest = this.reachesAccessCheck(decl.file, decl.node, depth - 1, visiting);
        visiting.delete(key);
        if (rest) {
          found = [key, ...rest];
          return;
        }
      }
      ts.forEachChild(n, visit);
    };
    visit(node);
    return found;
  }

  /** Checks every exported HTTP method of one route file. */
  routeHandlers(file: string): HandlerReport[] {
    const sf = this.source(file);
    if (!sf) throw new Error(`cannot read ${file}`);
    const reports: HandlerReport[] = [];
    for (const name of exportedNames(sf)) {
      if (!(HTTP_METHODS as readonly string[]).includes(name)) continue;
      reports.push(this.handler(file, name));
    }
    return reports;
  }

  private handler(file: string, method: string): HandlerReport {
    const report: HandlerReport = { file, method, viaPipeline: false, public: false, accessPath: null };
    // Follow `export const PUT = PATCH` and `export { x as GET }` to the expression that makes it.
    let decl = this.exported(file, method);
    for (let i = 0; decl && i < 5; i++) {
      const init = ts.isVariableDeclaration(decl.node) ? decl.node.initializer : undefined;
      if (init && ts.isIdentifier(init)) decl = this.binding(decl.file, init.text);
      else break;
    }
    const init = decl && ts.isVariableDeclaration(decl.node) ? decl.node.initializer : undefined;
    if (!decl || !init || !ts.isCallExpression(init) || !ts.isIdentifier(init.expression)) {
      return { ...report, problem: 'not created by route() from lib/api' };
    }
    const factory = this.binding(decl.file, init.expression.text);
    const factoryId = factory && `${factory.file}#${factory.name}`;
    const made = factoryId ? PIPELINE_FACTORIES[factoryId] : undefined;
    if (!factory || !factoryId || !made) {
      return { ...report, problem: `created by ${init.expression.text}(), not route() from lib/api` };
    }
    report.viaPipeline = true;
    // A factory that checks before the handler: its own path to can() is the handler's.
    const checked = CHECKING_FACTORIES.has(factoryId)
      ? this.reachesAccessCheck(factory.file, factory.node)
      : null;
    if ('handler' in made) {
      const fn = init.arguments[made.handler];
      report.accessPath = checked ?? (fn ? this.reachesAccessCheck(decl.file, fn) : null);
      if (!report.accessPath) report.problem = 'its handler never reaches can()';
      return report;
    }
    const spec = init.arguments[made.spec];
    if (!spec || !ts.isObjectLiteralExpression(spec)) {
      return { ...report, problem: `${init.expression.text}() is not given an object literal spec` };
    }
    report.accessPath = checked;
    for (const p of spec.properties) {
      const key = p.name && ts.isIdentifier(p.name) ? p.name.text : undefined;
      if (key === 'auth') {
        report.public = !(ts.isPropertyAssignment(p) && p.initializer.kind === ts.SyntaxKind.TrueKeyword);
      }
      if (key === 'handler') {
        let body: ts.Node = p;
        if (ts.isPropertyAssignment(p) && ts.isIdentifier(p.initializer)) {
          body = this.binding(decl.file, p.initializer.text)?.node ?? p;
        }
        report.accessPath = checked ?? this.reachesAccessCheck(decl.file, body);
      }
    }
    if (!report.accessPath && !report.public) report.problem = 'its handler never reaches can()';
    return report;
  }

  /** Server actions of a file: every exported function of a 'use server' file, and inline ones. */
  serverActions(file: string): HandlerReport[] {
    const sf = this.source(file);
    if (!sf) throw new Error(`cannot read ${file}`);
    const reports: HandlerReport[] = [];
    const check = (name: string, node: ts.Node) => {
      const accessPath = this.reachesAccessCheck(file, node);
      reports.push({
        file,
        method: `action ${name}`,
        viaPipeline: false,
        public: false,
        accessPath,
        ...(accessPath ? {} : { problem: 'this server action never reaches can()' }),
      });
    };
    if (hasUseServer(sf.statements)) {
      for (const name of exportedNames(sf)) {
        const decl = this.exported(file, name);
        if (decl) check(name, decl.node);
      }
    }
    const visit = (n: ts.Node) => {
      if (
        (ts.isFunctionDeclaration(n) || ts.isFunctionExpression(n) || ts.isArrowFunction(n)) &&
        n.body &&
        ts.isBlock(n.body) &&
        hasUseServer(n.body.statements)
      ) {
        check(ts.isFunctionDeclaration(n) && n.name ? n.name.text : `(inline, line ${lineOf(sf, n)})`, n);
      }
      ts.forEachChild(n, visit);
    };
    visit(sf);
    return reports;
  }
}

function hasUseServer(statements: ts.NodeArray<ts.Statement>): boolean {
  for (const st of statements) {
    if (!ts.isExpressionStatement(st) || !ts.isStringLiteral(st.expression)) return false;
    if (st.expression.text === 'use server') return true;
  }
  return false;
}

const lineOf = (sf: ts.SourceFile, n: ts.Node) => sf.getLineAndCharacterOfPosition(n.getStart()).line + 1;

const isExported = (n: ts.Node) =>
  ts.canHaveModifiers(n) && (ts.getModifiers(n) ?? []).some((m) => m.kind === ts.SyntaxKind.ExportKeyword);

/** Every value name a module exports. */
export function exportedNames(sf: ts.SourceFile): string[] {
  const names: string[] = [];
  for (const st of sf.statements) {
    if (ts.isFunctionDeclaration(st) && isExported(st) && st.name) names.push(st.name.text);
    if (ts.isVariableStatement(st) && isExported(st)) {
      for (const d of st.declarationList.declarations) if (ts.isIdentifier(d.name)) names.push(d.name.text);
    }
    if (
      ts.isExportDeclaration(st) &&
      !st.isTypeOnly &&
      st.exportClause &&
      ts.isNamedExports(st.exportClause)
    ) {
      for (const el of st.exportClause.elements) if (!el.isTypeOnly) names.push(el.name.text);
    }
  }
  return names;
}

/** Repository-relative paths of the files under `dir` whose name matches. */
export function filesUnder(dir: string, match: (name: string) => boolean): string[] {
  const out: string[] = [];
  const walk = (rel: string) => {
    for (const entry of readdirSync(path.join(ROOT, rel), { withFileTypes: true })) {
      const child = path.posix.join(rel, entry.name);
      if (entry.isDirectory()) {
        if (entry.name !== 'node_modules' && !entry.name.startsWith('.')) walk(child);
      } else if (match(entry.name)) out.push(child);
    }
  };
  if (existsSync(path.join(ROOT, dir))) walk(dir);
  return out.sort();
}
