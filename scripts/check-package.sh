#!/usr/bin/env bash
# Shows that warmcast works as another project gets it: packs the package as `npm pack` makes it
# (the tarball a user installs from a clone or a release), installs it into a new temporary
# project, runs the command-line tool there on a bundled pathway, and calls the library from an
# ES module and from TypeScript (the published types). Prints each step; exits non-zero on the
# first failure. Uses the npm cache where it can, so it needs the registry only for a first install.
#
# Try: bash scripts/check-package.sh
set -euo pipefail
cd "$(dirname "$0")/.."
repo=$(pwd)
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT

echo "package: npm pack"
tarball=$(npm pack --silent --pack-destination "$work" | tail -1)
mkdir "$work/consumer"
cd "$work/consumer"
npm init -y >/dev/null
npm pkg set type=module >/dev/null
echo "package: npm install $tarball into a new project"
npm install --no-audit --no-fund --prefer-offline "$work/$tarball" >/dev/null

echo "package: the command-line tool"
npx --no-install warmcast --version
npx --no-install warmcast run swift --to 2100 --no-chart --out swift.csv >/dev/null
head -1 swift.csv | cut -c1-72
test -s swift.meta.json

echo "package: the library from an ES module"
cat > use.mjs <<'JS'
import { calibrate, loadPathway, projectPathway } from 'warmcast';
const run = projectPathway(loadPathway('swift'), { params: calibrate({ ecsK: 3, tcrK: 1.8 }) });
const k = run.years.indexOf(2100);
if (!(run.columns.warming_k[k] > 0)) throw new Error('no warming for 2100');
console.log(`swift, 2100: ${run.columns.warming_k[k].toFixed(2)} K above 1850-1900`);
JS
node use.mjs

echo "package: the library's types from TypeScript"
cat > use.ts <<'TS'
import { calibrate, loadPathway, projectPathway, type Projection } from 'warmcast';
const run: Projection = projectPathway(loadPathway('swift'), { params: calibrate({ ecsK: 3 }) });
const warming: Float64Array = run.columns.warming_k;
console.log(warming.length);
TS
cat > tsconfig.json <<'JSON'
{ "compilerOptions": { "module": "NodeNext", "moduleResolution": "NodeNext", "target": "ES2022", "strict": true, "noEmit": true, "types": [] }, "files": ["use.ts"] }
JSON
"$repo/node_modules/.bin/tsc" -p tsconfig.json
echo "package: ok"
