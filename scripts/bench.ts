// `npm run bench`: runs the benchmark of every library in turn (their own tables on the way) and ends with one table
// of the headline figures each reports on its `bench-summary:` line.
import { spawn } from 'node:child_process';

type Figure = { library: string; measure: string; value: number; unit: string };

function runBench(workspace: string): Promise<Figure[]> {
  return new Promise((resolve, reject) => {
    const child = spawn('npm', ['run', 'bench', '-w', workspace], { stdio: ['ignore', 'pipe', 'inherit'] });
    let text = '';
    child.stdout.on('data', (b: Buffer) => {
      text += b.toString();
      process.stdout.write(b);
    });
    child.on('exit', (code) => {
      if (code !== 0) return reject(new Error(`npm run bench -w ${workspace} exited with ${code}`));
      const line = text.split('\n').find((l) => l.startsWith('bench-summary: '));
      resolve(line ? (JSON.parse(line.slice('bench-summary: '.length)) as Figure[]) : []);
    });
  });
}

const figures: Figure[] = [];
for (const w of ['libs/mesh', 'libs/solver', 'libs/synth', 'apps/web']) figures.push(...(await runBench(w)));
const value = (f: Figure): string => (f.value >= 100 ? f.value.toFixed(0) : f.value >= 1 ? f.value.toFixed(1) : f.value.toFixed(3));
process.stdout.write(`\n## Summary (Node ${process.version}, ${new Date().toISOString().slice(0, 10)})\n\n| library | measure | value |\n| --- | --- | --- |\n${figures.map((f) => `| ${f.library} | ${f.measure} | ${value(f)} ${f.unit} |`).join('\n')}\n`);
