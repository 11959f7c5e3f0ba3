/**
 * Builds dist/: the shared runtime page (taskpane.html: custom functions + pane), the
 * preview workbook (preview.html, when src/preview exists), functions.json, the icons and
 * the manifest.
 *
 *   npm run build       production: taskpane.html loads office.js from Microsoft's CDN and
 *                       its policy allows that origin; STARPOINT_PUBLIC_URL=https://host/path
 *                       rewrites the manifest's https://localhost:3000 to that address (a
 *                       build without it warns: the manifest then points at localhost)
 *   npm run build:dev   development: a local copy of office.js in dist/office-js, the
 *                       manifest kept on https://localhost:3000; nothing loads from outside
 */
const fs = require('node:fs');
const path = require('node:path');
const { execFileSync } = require('node:child_process');
const { WebpackError } = require('webpack');
const HtmlWebpackPlugin = require('html-webpack-plugin');
const CopyWebpackPlugin = require('copy-webpack-plugin');
const CustomFunctionsMetadataPlugin = require('custom-functions-metadata-plugin');
const { publicUrl, rewriteManifest, missingUrlWarning } = require('./scripts/public-url');
const { officeJsSrc, paneCsp } = require('./scripts/pane-page');

const root = (...parts) => path.resolve(__dirname, ...parts);

/** Fails the build when a named entry pulls in a module from one of `packages`. */
class KeepPackagesOutOfEntry {
  constructor(entry, packages) {
    this.entry = entry;
    this.packages = packages;
  }
  apply(compiler) {
    compiler.hooks.thisCompilation.tap('KeepPackagesOutOfEntry', (compilation) => {
      compilation.hooks.afterSeal.tap('KeepPackagesOutOfEntry', () => {
        const entrypoint = compilation.entrypoints.get(this.entry);
        if (!entrypoint) return;
        const offending = new Set();
        const visit = (module) => {
          if (module.modules) module.modules.forEach(visit); // concatenated modules
          const resource = (module.resource ?? '').split(path.sep).join('/');
          for (const pkg of this.packages) {
            if (resource.includes(`/node_modules/${pkg}/`)) offending.add(pkg);
          }
        };
        for (const chunk of entrypoint.chunks) {
          for (const module of compilation.chunkGraph.getChunkModulesIterable(chunk)) visit(module);
        }
        for (const pkg of offending) {
          compilation.errors.push(
            new WebpackError(`${pkg} ended up in the "${this.entry}" bundle; it is for the preview only. Check imports from src/taskpane and src/functions.`),
          );
        }
      });
    });
  }
}

/** Fails the build when the committed declarations.ts no longer matches the registry. */
class DeclarationsAreFresh {
  apply(compiler) {
    let problem = null;
    const check = () => {
      problem = null;
      try {
        execFileSync(process.execPath, [require.resolve('tsx/cli'), root('scripts/gen-declarations.ts'), '--check'], {
          cwd: root(),
          stdio: 'pipe',
        });
      } catch (e) {
        problem = `${e.stdout ?? ''}${e.stderr ?? ''}`.trim() || String(e);
      }
    };
    compiler.hooks.beforeRun.tap('DeclarationsAreFresh', check);
    compiler.hooks.watchRun.tap('DeclarationsAreFresh', check);
    compiler.hooks.thisCompilation.tap('DeclarationsAreFresh', (compilation) => {
      if (problem) compilation.errors.push(new WebpackError(problem));
    });
  }
}

/** Adds a build warning (shown with webpack's own warnings). */
class WarnWith {
  constructor(message) {
    this.message = message;
  }
  apply(compiler) {
    compiler.hooks.thisCompilation.tap('WarnWith', (compilation) => {
      compilation.warnings.push(new WebpackError(this.message));
    });
  }
}

/** Warns when functions.json came out empty (a registry with no functions yet). */
class WarnOnEmptyMetadata {
  apply(compiler) {
    compiler.hooks.thisCompilation.tap('WarnOnEmptyMetadata', (compilation) => {
      compilation.hooks.afterProcessAssets.tap('WarnOnEmptyMetadata', (assets) => {
        const asset = assets['functions.json'];
        if (asset && asset.size() === 0) {
          compilation.warnings.push(new WebpackError('functions.json is empty: the registry has no functions, so Excel will list none.'));
        }
      });
    });
  }
}

module.exports = (env, argv) => {
  const production = argv.mode === 'production';
  // Throws on a bad address, so a production build never ships a broken manifest.
  const base = production ? publicUrl(process.env.STARPOINT_PUBLIC_URL) : null;

  const hasPreview = fs.existsSync(root('src/preview/main.ts')) && fs.existsSync(root('src/preview/preview.html'));
  if (!hasPreview) console.warn('webpack: src/preview/main.ts or preview.html missing; building without the preview page.');

  const entry = { taskpane: './src/taskpane/index.ts' };
  const pages = [
    new HtmlWebpackPlugin({
      filename: 'taskpane.html',
      template: './src/taskpane/taskpane.html',
      chunks: ['taskpane'],
      hash: production,
      templateParameters: { officeJs: officeJsSrc(production), csp: paneCsp(production) },
    }),
  ];
  if (hasPreview) {
    entry.preview = './src/preview/main.ts';
    pages.push(
      new HtmlWebpackPlugin({
        filename: 'preview.html',
        template: './src/preview/preview.html',
        chunks: ['preview'],
        hash: production,
      }),
    );
  }

  return {
    mode: production ? 'production' : 'development',
    context: root(),
    entry,
    output: {
      path: root('dist'),
      // Entries keep stable names (the manifest names taskpane.js); split chunks are hashed.
      filename: '[name].js',
      chunkFilename: production ? '[name].[contenthash:8].js' : '[name].js',
      clean: true,
    },
    devtool: 'source-map',
    resolve: { extensions: ['.ts', '.js'] },
    module: {
      rules: [
        {
          test: /\.ts$/,
          exclude: /node_modules/,
          use: { loader: 'ts-loader', options: { onlyCompileBundledFiles: true } },
        },
        // `import css from './pane.css?raw'` gives the stylesheet text (Vite reads ?raw the same way).
        { resourceQuery: /raw/, type: 'asset/source' },
      ],
    },
    optimization: {
      // The two pages never load together, so nothing is shared between them: taskpane.js
      // stays one self-contained file (the manifest's Script URL names it) and only the
      // preview is split, its formula engine into a chunk of its own.
      splitChunks: {
        chunks: (chunk) => chunk.name === 'preview',
        cacheGroups: {
          previewEngine: {
            test: /[\\/]node_modules[\\/]hyperformula[\\/]/,
            name: 'preview-engine',
            chunks: (chunk) => chunk.name === 'preview',
            priority: 20,
            enforce: true,
          },
          previewVendors: {
            test: /[\\/]node_modules[\\/]/,
            name: 'preview-vendors',
            chunks: (chunk) => chunk.name === 'preview',
            priority: 10,
          },
        },
      },
    },
    performance: { hints: production ? 'warning' : false, maxAssetSize: 3_000_000, maxEntrypointSize: 3_000_000 },
    plugins: [
      new DeclarationsAreFresh(),
      new CustomFunctionsMetadataPlugin({ input: './src/functions/excel/declarations.ts', output: 'functions.json' }),
      new WarnOnEmptyMetadata(),
      new KeepPackagesOutOfEntry('taskpane', ['hyperformula', 'exceljs', 'idb-keyval']),
      ...pages,
      new CopyWebpackPlugin({
        patterns: [
          { from: 'assets', to: 'assets' },
          {
            from: 'manifest/manifest.xml',
            to: 'manifest.xml',
            transform: (content) => (base ? rewriteManifest(content.toString('utf8'), base) : content),
          },
          // Production pages load office.js from the CDN, so only development copies it.
          ...(production
            ? []
            : [
                {
                  // office.js loads its host and locale scripts from its own folder, so copy it whole
                  // (minus debug builds and typings; taskpane.html loads office.js, not office.debug.js).
                  from: 'node_modules/@microsoft/office-js/dist',
                  to: 'office-js',
                  globOptions: { ignore: ['**/*.debug.js', '**/*.d.ts', '**/office-vsdoc.js'] },
                  // Already minified: keep Terser off these 26 MB (it would take minutes).
                  info: { minimized: true },
                },
              ]),
        ],
      }),
      ...(production && !base ? [new WarnWith(missingUrlWarning())] : []),
    ],
  };
};
