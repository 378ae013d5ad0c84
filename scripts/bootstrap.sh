#!/usr/bin/env bash
# Installs whatever a fresh Debian machine with only Node.js and npm lacks, then runs
# scripts/<command>.ts. Used by `npm start`, `npm test` and `npm run dev`.
set -euo pipefail
# The AWS SDK warns at every start that its Node 20 support ends; versions are pinned (DEVELOPERS.md).
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true
cd "$(dirname "$0")/.."
cmd="${1:?usage: bootstrap.sh start|test|dev|lint|bench/index}"
shift

need=()
# Linting needs only the npm packages.
if [ "$cmd" != lint ]; then
ls /usr/lib/postgresql/*/bin/postgres >/dev/null 2>&1 || need+=(postgresql)
command -v ffmpeg >/dev/null 2>&1 && command -v ffprobe >/dev/null 2>&1 || need+=(ffmpeg)
command -v setpriv >/dev/null 2>&1 || need+=(util-linux)
if [ "$cmd" = test ] && ! [ -x /usr/bin/chromium ]; then need+=(chromium); fi
# The report tests read the PDF back with pdftotext and render its pages with pdftoppm.
if [ "$cmd" = test ] && ! { command -v pdftotext >/dev/null 2>&1 && command -v pdftoppm >/dev/null 2>&1; }; then need+=(poppler-utils); fi
if [ ${#need[@]} -gt 0 ]; then
  echo "[wickmark] installing Debian packages: ${need[*]}"
  if [ "$(id -u)" -ne 0 ]; then sudo="sudo"; else sudo=""; fi
  $sudo apt-get update -qq
  DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq --no-install-recommends "${need[@]}" >/dev/null
fi
fi

# npm ci when node_modules is missing or older than the lockfile.
if ! [ -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "[wickmark] installing npm packages (npm ci)"
  npm ci --no-audit --no-fund
fi

# ffmpeg.wasm is served from the app itself; its files are copied from node_modules, never committed.
[ -f public/ffmpeg/core/ffmpeg-core.wasm ] || node scripts/copy-ffmpeg.mjs

# `dev` is `start` with next dev and hot reload.
if [ "$cmd" = dev ]; then cmd=start; set -- --dev "$@"; fi
# npm does not pass SIGTERM on through its shell; the parent-death signal makes sure the
# orchestrator (and with it every service) stops when npm is stopped. `react-server`: see SERVER_TS_ARGS
# in scripts/services/service.ts.
exec setpriv --pdeathsig=TERM -- node --conditions=react-server --import ./node_modules/tsx/dist/loader.mjs "scripts/$cmd.ts" "$@"
