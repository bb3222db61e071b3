import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '../../../..'); // dist/node/scripts/bench-support → the repository

/**
 * The blank app the start-up and Lighthouse benchmarks compare with: one toolbar and one button of
 * Angular Material, zoneless, built by the same CLI in a temporary folder (answered; the caller
 * removes it). Its files are in `dist/browser` there.
 */
export function buildBlankApp(): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'lamplight-blank-app-'));
  symlinkSync(path.join(ROOT, 'node_modules'), path.join(dir, 'node_modules'));
  mkdirSync(path.join(dir, 'src'));
  const files: Record<string, unknown> = {
    'package.json': { name: 'blank', private: true },
    'tsconfig.json': {
      compilerOptions: { strict: true, target: 'ES2022', module: 'preserve', moduleResolution: 'bundler', skipLibCheck: true, lib: ['ES2022', 'dom'] },
      angularCompilerOptions: { strictTemplates: true },
      files: ['src/main.ts'],
    },
    'angular.json': {
      version: 1,
      newProjectRoot: 'projects',
      projects: {
        blank: {
          projectType: 'application',
          root: '',
          sourceRoot: 'src',
          architect: {
            build: {
              builder: '@angular/build:application',
              options: { browser: 'src/main.ts', index: 'src/index.html', tsConfig: 'tsconfig.json', styles: ['src/styles.scss'], outputPath: 'dist' },
              configurations: { production: { outputHashing: 'all', budgets: [] } },
              defaultConfiguration: 'production',
            },
          },
        },
      },
    },
  };
  for (const [name, json] of Object.entries(files)) writeFileSync(path.join(dir, name), JSON.stringify(json, null, 2));
  writeFileSync(
    path.join(dir, 'src/index.html'),
    '<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Blank</title></head><body><app-root></app-root></body></html>',
  );
  writeFileSync(
    path.join(dir, 'src/styles.scss'),
    "@use '@angular/material' as mat;\nhtml { @include mat.theme((color: mat.$violet-palette, typography: Roboto, density: 0)); }\n",
  );
  writeFileSync(
    path.join(dir, 'src/main.ts'),
    `import { ChangeDetectionStrategy, Component, provideZonelessChangeDetection } from '@angular/core';
import { bootstrapApplication } from '@angular/platform-browser';
import { MatButtonModule } from '@angular/material/button';
import { MatToolbarModule } from '@angular/material/toolbar';

@Component({
  selector: 'app-root',
  imports: [MatButtonModule, MatToolbarModule],
  template: '<mat-toolbar>Blank</mat-toolbar><main><h1 class="first">First render</h1><button mat-flat-button>Go on</button></main>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
class Root {}

bootstrapApplication(Root, { providers: [provideZonelessChangeDetection()] }).catch((error) => console.error(error));
`,
  );
  // Chunks merged as in Lamplight's own build (`npm run build`).
  execFileSync(path.join(ROOT, 'node_modules/.bin/ng'), ['build'], {
    cwd: dir,
    stdio: 'inherit',
    env: { ...process.env, NG_CLI_ANALYTICS: 'false', NG_BUILD_OPTIMIZE_CHUNKS: '1' },
  });
  return dir;
}
