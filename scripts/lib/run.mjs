import { spawn, spawnSync } from 'node:child_process';

/** Run a command, inherit output, reject with a readable message on failure. */
export function run(cmd, args, opts = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: opts.quiet ? 'pipe' : 'inherit', ...opts });
    let out = '';
    let err = '';
    child.stdout?.on('data', (d) => (out += d));
    child.stderr?.on('data', (d) => (err += d));
    child.on('error', reject);
    child.on('close', (code) => {
      if (code === 0) resolve({ out, err });
      else reject(new Error(`${cmd} ${args.join(' ')} exited with ${code}\n${err || out}`));
    });
  });
}

export function runSync(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { encoding: 'utf8', ...opts });
  return { status: r.status, out: r.stdout ?? '', err: r.stderr ?? '' };
}

export function isRoot() {
  return typeof process.getuid === 'function' && process.getuid() === 0;
}

export function hasCommand(name) {
  return runSync('sh', ['-c', `command -v ${name}`]).status === 0;
}
