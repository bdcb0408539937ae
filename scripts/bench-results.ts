// Each benchmark adds its figures to bench-results/latest.json (gitignored), with the machine they came from.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';

const FILE = 'bench-results/latest.json';

export function record(section: string, figures: unknown) {
  mkdirSync('bench-results', { recursive: true });
  const current = existsSync(FILE) ? JSON.parse(readFileSync(FILE, 'utf8')) : {};
  current.machine = { cpus: os.cpus().length, cpu: os.cpus()[0]?.model, memoryGb: Math.round(os.totalmem() / 2 ** 30), node: process.version, platform: `${os.platform()} ${os.release()}` };
  current.at = new Date().toISOString();
  current[section] = figures;
  writeFileSync(FILE, `${JSON.stringify(current, null, 2)}\n`);
}
