import { existsSync } from 'node:fs';
import { run, isRoot, hasCommand } from './run.mjs';
import { step, fail } from './log.mjs';

let updated = false;

/** Install Debian packages when a file they provide is missing. Says what it does and why. */
export async function ensureDebianPackages(packages, why, probe) {
  if (probe()) return;
  if (!hasCommand('apt-get')) {
    fail(
      `${why} needs the Debian package(s) ${packages.join(', ')}, and apt-get is not available. Install them and run again.`,
    );
  }
  if (!isRoot()) {
    fail(
      `${why} needs the Debian package(s) ${packages.join(', ')}. Run: sudo apt-get install -y ${packages.join(' ')}`,
    );
  }
  step(`installing ${packages.join(', ')} from Debian's packages (${why})…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  try {
    if (!updated) {
      await run('apt-get', ['update', '-qq'], { env, quiet: true });
      updated = true;
    }
    await run('apt-get', ['install', '-y', '-qq', '--no-install-recommends', ...packages], {
      env,
      quiet: true,
    });
  } catch (e) {
    fail(`could not install ${packages.join(', ')} with apt-get: ${e.message}`);
  }
  if (!probe()) fail(`${packages.join(', ')} installed but still not found`);
}

// The headless shell is Debian's chromium build without the desktop browser around it: the
// browser suite spends about a fifth less CPU in it than in the full chromium (docs/performance.md).
export const chromiumPath = '/usr/bin/chromium-headless-shell';
export const ensureChromium = () =>
  ensureDebianPackages(['chromium-headless-shell'], 'browser tests', () =>
    existsSync(chromiumPath),
  );
export const ensurePoppler = () =>
  ensureDebianPackages(
    ['poppler-utils'],
    'PDF checks',
    () => hasCommand('pdftoppm') && hasCommand('pdffonts'),
  );
export const ensureDejaVu = () =>
  ensureDebianPackages(['fonts-dejavu-core'], 'math symbols in PDFs', () =>
    existsSync('/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf'),
  );
