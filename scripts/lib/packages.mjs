// Makes sure the npm and Debian packages the project needs are installed.
import { accessSync, constants, existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { ROOT } from './env.mjs';
import { log, run } from './proc.mjs';

function readJson(file) {
  return JSON.parse(readFileSync(file, 'utf8'));
}

/**
 * Why node_modules does not match the lockfile (or package.json), or null when it does.
 * Compares the version of every locked package with the one installed; cheap (a few hundred small reads).
 */
export function nodeModulesProblem(root = ROOT) {
  const nm = path.join(root, 'node_modules');
  if (!existsSync(nm)) return 'node_modules is missing';
  const lockFile = path.join(root, 'package-lock.json');
  if (existsSync(lockFile)) {
    const lock = readJson(lockFile);
    for (const [key, entry] of Object.entries(lock.packages ?? {})) {
      if (!key.startsWith('node_modules/') || entry.link) continue;
      const manifest = path.join(root, key, 'package.json');
      if (!existsSync(manifest)) {
        // Optional packages for other platforms are legitimately absent.
        if (entry.optional || entry.devOptional || entry.peer) continue;
        return `${key.slice('node_modules/'.length)} is not installed`;
      }
      if (entry.version && readJson(manifest).version !== entry.version) {
        return `${key.slice('node_modules/'.length)} is not at the locked version ${entry.version}`;
      }
    }
    return null;
  }
  const pkg = readJson(path.join(root, 'package.json'));
  for (const name of Object.keys({ ...pkg.dependencies, ...pkg.devDependencies })) {
    if (!existsSync(path.join(nm, name, 'package.json'))) return `${name} is not installed`;
  }
  return null;
}

/** Installs npm packages when node_modules is missing or stale: `npm ci` with a lockfile, else `npm install`. */
export async function ensureNodeModules() {
  const problem = nodeModulesProblem();
  if (!problem) return false;
  const hasLock = existsSync(path.join(ROOT, 'package-lock.json'));
  log(`Installing npm packages (${problem}) with npm ${hasLock ? 'ci' : 'install'} ...`);
  const args = hasLock ? ['ci', '--no-audit', '--no-fund'] : ['install', '--no-audit', '--no-fund'];
  await run('npm', args, { env: { ...process.env, npm_config_yes: 'true' } });
  return true;
}

function executable(file) {
  try {
    accessSync(file, constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

/** Full path of a program on PATH or in the sbin folders (often off PATH), or null. */
export function findProgram(name) {
  const dirs = [...(process.env.PATH ?? '').split(':'), '/usr/sbin', '/usr/local/sbin', '/sbin', '/usr/bin'];
  for (const dir of dirs) {
    if (!dir) continue;
    const p = path.join(dir, name);
    if (executable(p)) return p;
  }
  return null;
}

let aptUpdated = false;

/**
 * Installs Debian packages whose program is missing. `wanted` maps a program to its package,
 * e.g. { mariadbd: 'mariadb-server', chromium: ['chromium', 'fonts-liberation'] }.
 * Needs root (or passwordless sudo).
 */
export async function ensureApt(wanted, { quiet = false } = {}) {
  const missing = [
    ...new Set(
      Object.entries(wanted)
        .filter(([prog]) => !findProgram(prog))
        .flatMap(([, pkgs]) => pkgs),
    ),
  ];
  if (missing.length === 0) return false;
  if (!findProgram('apt-get')) {
    throw new Error(`missing system packages (${missing.join(', ')}) and no apt-get to install them`);
  }
  const isRoot = process.getuid?.() === 0;
  const sudo = isRoot ? [] : ['sudo', '-n'];
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const exec = (args) => {
    const [cmd, ...rest] = [...sudo, 'apt-get', ...args];
    return run(cmd, rest, { env, capture: quiet });
  };
  log(`Installing Debian packages: ${missing.join(' ')} ...`);
  if (!aptUpdated) {
    await exec(['update', '-q']);
    aptUpdated = true;
  }
  // Waits for a dpkg lock held by another apt run instead of failing at once.
  await exec(['install', '-y', '-q', '-o', 'DPkg::Lock::Timeout=300', '--no-install-recommends', ...missing]);
  const still = Object.entries(wanted).filter(([prog]) => !findProgram(prog));
  if (still.length)
    throw new Error(`installed ${missing.join(', ')} but ${still.map(([p]) => p).join(', ')} still missing`);
  return true;
}
