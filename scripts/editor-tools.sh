#!/usr/bin/env bash
# Installs the tools the real-editor tests need (see ../shared/EDITOR-TESTING.md), idempotently and
# with pinned versions, into the git-ignored folder .editor-tools/ — never into the project's own
# dependencies (code-server is ~300 MB and builds native modules for minutes).
#
#   bash scripts/editor-tools.sh          # install or verify; seconds when already installed
#   EDITOR_TOOLS_DIR=/abs/dir bash ...    # install elsewhere
#
# What it installs:
#   Debian: chromium (the browser that drives the editor), ripgrep (its rg stands in for the one
#           @vscode/ripgrep would download), libkrb5-dev + pkg-config (kerberos native module build).
#   npm:    code-server 4.100.3 (VS Code 1.100.3; newer releases need Node >= 22) and
#           playwright-core 1.65.1, pinned by test/editor/tools/package.json and its lock file.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
TOOLS="${EDITOR_TOOLS_DIR:-$ROOT/.editor-tools}"
PINS="$ROOT/test/editor/tools"
CODE_SERVER_VERSION=4.100.3
# The @vscode/ripgrep version that code-server 4.100.3 pulls in; its cache folder name follows it.
VSCODE_RIPGREP_VERSION=1.15.11
# The archive name @vscode/ripgrep 1.15.11 asks for on x86_64 Linux (its VERSION + target).
RG_ARCHIVE=ripgrep-v13.0.0-10-x86_64-unknown-linux-musl.tar.gz
APT_PACKAGES=(chromium ripgrep libkrb5-dev pkg-config)

log() { printf '[editor-tools] %s\n' "$*"; }
started=$(date +%s)

# --- 1. Debian packages -----------------------------------------------------------------------
# dpkg-query is instant; apt-get update takes ~10 s and touches the network, so only when needed.
missing=()
for pkg in "${APT_PACKAGES[@]}"; do
  status="$(dpkg-query -W -f='${Status}' "$pkg" 2>/dev/null || true)"
  if [[ "$status" != "install ok installed" ]]; then
    missing+=("$pkg")
  fi
done
if ((${#missing[@]})); then
  log "apt-get install ${missing[*]}"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -q
  apt-get install -y -q "${APT_PACKAGES[@]}"
else
  log "Debian packages present: ${APT_PACKAGES[*]}"
fi
[[ -x /usr/bin/chromium ]] || { log "chromium missing after install"; exit 1; }
[[ -x /usr/bin/rg ]] || { log "rg missing after install"; exit 1; }

# --- 2. npm tools, pinned ---------------------------------------------------------------------
# The stamp records exactly which pins were installed; a changed pin file reinstalls.
pin_files=("$PINS/package.json")
[[ -f "$PINS/package-lock.json" ]] && pin_files+=("$PINS/package-lock.json")
pins_hash="$(cat "${pin_files[@]}" | sha256sum | cut -c1-16)"
stamp="$TOOLS/.installed-$pins_hash"
cs_bin="$TOOLS/node_modules/code-server/out/node/entry.js"
if [[ -f "$stamp" && -f "$cs_bin" && -d "$TOOLS/node_modules/playwright-core" ]]; then
  log "code-server and playwright-core already installed in $TOOLS"
else
  mkdir -p "$TOOLS/tmp"
  rm -f "$TOOLS"/.installed-*
  cp "$PINS/package.json" "$TOOLS/package.json"
  [[ -f "$PINS/package-lock.json" ]] && cp "$PINS/package-lock.json" "$TOOLS/package-lock.json"

  # @vscode/ripgrep's postinstall downloads rg from a release website, which these machines cannot
  # reach. It first looks for the archive in $TMPDIR/vscode-ripgrep-cache-<its version>/ and then
  # says "Using cached download"; so we pack Debian's rg (as `rg` at the archive root, where its
  # untar step expects it) under that name. TMPDIR points into TOOLS so nothing lands in /tmp.
  export TMPDIR="$TOOLS/tmp"
  cache="$TMPDIR/vscode-ripgrep-cache-$VSCODE_RIPGREP_VERSION"
  mkdir -p "$cache"
  if [[ ! -s "$cache/$RG_ARCHIVE" ]]; then
    tar -czf "$cache/$RG_ARCHIVE" -C /usr/bin rg
  fi

  # unsafe_perm: code-server's postinstall refuses to run as root otherwise.
  # yes: a nested `npx node-gyp` would wait for a confirmation that never comes and be cancelled.
  # nodedir=/usr: node-gyp would download Node's headers; Debian/NodeSource ship them in /usr/include/node.
  export npm_config_unsafe_perm=true npm_config_yes=true npm_config_nodedir=/usr
  export npm_config_audit=false npm_config_fund=false npm_config_update_notifier=false
  log "installing code-server $CODE_SERVER_VERSION and playwright-core into $TOOLS (several minutes on 2 cores)"
  cd "$TOOLS"
  if [[ -f package-lock.json ]]; then npm ci --no-audit --no-fund; else npm install --no-audit --no-fund; fi
  cd - >/dev/null
  touch "$stamp"
fi

# --- 3. Verify what was installed ---------------------------------------------------------------
version="$(node -p "require('$TOOLS/node_modules/code-server/package.json').version")"
[[ "$version" == "$CODE_SERVER_VERSION" ]] || { log "expected code-server $CODE_SERVER_VERSION, found $version"; exit 1; }
rg_in_vscode="$(find "$TOOLS/node_modules/code-server/lib/vscode/node_modules/@vscode/ripgrep/bin" -name rg 2>/dev/null | head -1)"
[[ -n "$rg_in_vscode" ]] || { log "code-server's @vscode/ripgrep has no rg binary (Quick Open would not find files)"; exit 1; }
log "ready: code-server $version, playwright-core $(node -p "require('$TOOLS/node_modules/playwright-core/package.json').version"), $(/usr/bin/chromium --version 2>/dev/null | head -1) ($(( $(date +%s) - started )) s)"
