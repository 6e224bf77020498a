// The esbuild options of the shipped build, shared by scripts/build.mjs and the tests that bundle
// the program into a folder of their own (so that they run exactly what is shipped).
import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';

/**
 * zod's `z` namespace re-exports every locale (about 250 languages), which a namespace import keeps
 * in the bundle and every start of `solve` would parse. Our messages are our own English, so the
 * locales namespace is narrowed to English only.
 */
const zodEnglishOnly = {
  name: 'zod-english-only',
  setup(b) {
    b.onResolve({ filter: /^\.\.\/locales\/index\.js$/ }, (args) =>
      /[\\/]zod[\\/]v4[\\/](classic|core)[\\/]/.test(args.importer)
        ? { path: 'zod-locales-en', namespace: 'zod-locales' }
        : undefined,
    );
    b.onLoad({ filter: /.*/, namespace: 'zod-locales' }, () => ({
      contents: "export { default as en } from 'zod/v4/locales/en.js';",
      resolveDir: process.cwd(),
    }));
  },
};

/**
 * In Node 20 the global `fetch` is a lazy getter: evaluating `typeof fetch` loads Node's whole HTTP
 * client (undici) at start-up. yoga-layout's loader asks it, although its wasm is an inline data URI
 * it decodes without fetch either way. Answering "no fetch" at build time spares every start that load.
 */
const yogaWithoutFetch = {
  name: 'yoga-without-fetch',
  setup(b) {
    b.onLoad({ filter: /yoga-layout[\\/]dist[\\/]binaries[\\/].*\.js$/ }, async (args) => {
      const text = await readFile(args.path, 'utf8');
      return { contents: text.replaceAll('typeof fetch', '"undefined"'), loader: 'js' };
    });
  },
};

/**
 * yoga-layout's entry awaits its WebAssembly at the top level, which a CommonJS bundle cannot
 * hold. Ink only calls yoga while rendering, never while loading, so the entry is replaced by
 * the same object filled in once the WebAssembly is ready; `runInteractive` (src/ui/run.tsx)
 * awaits that promise, kept under a global symbol, before the first render.
 */
const yogaWithoutTopLevelAwait = {
  name: 'yoga-without-top-level-await',
  setup(b) {
    b.onResolve({ filter: /^yoga-layout$/ }, () => ({
      path: 'yoga-layout',
      namespace: 'yoga-shim',
    }));
    b.onLoad({ filter: /.*/, namespace: 'yoga-shim' }, () => ({
      contents: [
        "import { loadYoga } from 'yoga-layout/load';",
        "export * from 'yoga-layout/load';",
        'const Yoga = {};',
        "globalThis[Symbol.for('skidcase.yoga-ready')] = loadYoga().then((y) => { Object.assign(Yoga, y); });",
        'export default Yoga;',
      ].join('\n'),
      resolveDir: process.cwd(),
    }));
  },
};

/**
 * Ink's reconciler awaits at the top level twice, only when DEV=true (to attach React's devtools,
 * which this program does not ship: Ink then only warns that react-devtools-core is missing). A
 * CommonJS bundle cannot hold a top-level await, so the build answers "not DEV" for both.
 */
const inkWithoutDevtools = {
  name: 'ink-without-devtools',
  setup(b) {
    b.onLoad({ filter: /[\\/]ink[\\/]build[\\/]reconciler\.js$/ }, async (args) => {
      const text = await readFile(args.path, 'utf8');
      const n = text.split('isDev()').length - 1;
      if (n !== 2) throw new Error(`${args.path}: expected isDev() twice, found ${n}`);
      return { contents: text.replaceAll('isDev()', 'false'), loader: 'js' };
    });
  },
};

/**
 * string-width, slice-ansi and ansi-tokenize each make an `Intl.Segmenter` when they are loaded,
 * which starts ICU's break iterators (10 ms and more, 25 ms on a busy machine) before the first
 * frame. Each is replaced by scripts/segmenter-fast.mjs: ICU's segmenter made on first real use,
 * and text of characters that are always their own grapheme (our screens' `·`, `…`, `↑`) split
 * without it. string-width's RGI emoji expression is built on first use too (rgiEmojiOnFirstUse).
 * The build fails if a package starts using its segmenter for anything but `segment`.
 */
const segmentersOnFirstUse = {
  name: 'segmenters-on-first-use',
  setup(b) {
    b.onLoad(
      {
        filter:
          /node_modules[\\/](string-width[\\/]index|slice-ansi[\\/]tokenize-ansi|@alcalzone[\\/]ansi-tokenize[\\/]build[\\/]tokenize)\.js$/,
      },
      async (args) => {
        const text = await readFile(args.path, 'utf8');
        const decl = /\b(?:const|let|var)\s+([\w$]+)\s*=\s*new Intl\.Segmenter\(/g;
        const names = [...text.matchAll(decl)].map((m) => m[1]);
        if (names.length === 0) throw new Error(`${args.path}: no Intl.Segmenter made at load`);
        for (const name of names) {
          const n = name.replace('$', '\\$');
          // a method other than segment(), or the segmenter handed on as a value
          const uses = text.match(
            new RegExp(`(?<![\\w$.])${n}\\.(?!segment\\()|[(,=]\\s*${n}\\s*[,);]`, 'g'),
          );
          if (uses) throw new Error(`${args.path}: ${name} is used for more than segment()`);
        }
        const helper = JSON.stringify(
          fileURLToPath(new URL('./segmenter-fast.mjs', import.meta.url)),
        );
        let contents =
          `import { createSegmenter as __createSegmenter } from ${helper};\n` +
          text.replace(/new Intl\.Segmenter\(/g, '__createSegmenter(');
        if (/string-width[\\/]index\.js$/.test(args.path))
          contents = rgiEmojiOnFirstUse(contents, helper);
        return { contents, loader: 'js' };
      },
    );
  },
};

/**
 * string-width builds `/^\p{RGI_Emoji}$/v` when it is loaded: 20-30 ms before the first frame.
 * It is replaced by scripts/segmenter-fast.mjs's test, which builds it only for a segment that
 * may be an emoji (a pictographic character, regional indicator, keycap mark or skin tone). The build fails if string-width declares it otherwise, or uses it
 * for anything but `test()`.
 */
function rgiEmojiOnFirstUse(text, helper) {
  const decl = 'const rgiEmojiRegex = /^\\p{RGI_Emoji}$/v;';
  if (text.split(decl).length !== 2)
    throw new Error(`string-width: expected one "${decl}", the RGI emoji test changed`);
  if (/rgiEmojiRegex(?!\.test\()(?! = \/)/.test(text))
    throw new Error('string-width: rgiEmojiRegex is used for more than test()');
  return (
    `import { createRgiEmojiTest as __createRgiEmojiTest } from ${helper};\n` +
    text.replace(decl, 'const rgiEmojiRegex = __createRgiEmojiTest();')
  );
}

/**
 * The program: `outdir/main.js`, CommonJS (`outdir/package.json`, `BUNDLE_PACKAGE_JSON`, says so;
 * the caller writes it). `node outdir/main.js ARGS` runs it; the installed command is the launcher.
 */
export function bundleOptions({ outdir = 'dist', version, buildId }) {
  return {
    entryPoints: { main: 'src/cli.ts' },
    outdir,
    bundle: true,
    // One CommonJS file: no ESM loader walking chunks at start-up. Modules reached only through a
    // dynamic import (Ink and React, the solve and report commands) are still evaluated only when
    // that import runs. dist/package.json says the folder is CommonJS (the project is ESM).
    format: 'cjs',
    platform: 'node',
    target: 'node20',
    minify: true,
    sourcemap: 'linked',
    legalComments: 'none',
    banner: {
      // Sources that locate files beside themselves read import.meta.url (the demo cases).
      js: "const __importMetaUrl = require('node:url').pathToFileURL(__filename).href;",
    },
    define: {
      'import.meta.url': '__importMetaUrl',
      'process.env.NODE_ENV': '"production"',
      __SKIDCASE_VERSION__: JSON.stringify(version),
      __SKIDCASE_BUILD__: JSON.stringify(buildId),
    },
    // PDFKit (with its font engine, some 2 MB) is loaded from node_modules only when a PDF is
    // made, as are the DejaVu font files it embeds: bundled, every start would parse it.
    external: ['react-devtools-core', 'pdfkit'],
    plugins: [
      zodEnglishOnly,
      yogaWithoutFetch,
      segmentersOnFirstUse,
      yogaWithoutTopLevelAwait,
      inkWithoutDevtools,
    ],
    logLevel: 'warning',
  };
}

/**
 * The launcher, `outdir/skidcase.js` (the package's `bin`): runs main.js through a V8 code cache
 * (src/launch.ts). It must stay small: it is compiled on every start without a cache.
 */
export function launcherOptions({ outdir = 'dist' }) {
  return {
    entryPoints: { skidcase: 'src/launch.ts' },
    outdir,
    bundle: true,
    format: 'cjs',
    platform: 'node',
    target: 'node20',
    minify: true,
    legalComments: 'none',
    banner: { js: '#!/usr/bin/env node' },
    logLevel: 'warning',
  };
}

/** The project is ESM (package.json "type": "module"); the bundle's folder is CommonJS. */
export const BUNDLE_PACKAGE_JSON = JSON.stringify({ type: 'commonjs' }) + '\n';
