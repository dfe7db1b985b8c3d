# Finds or installs the Debian packages Ringdown runs on. Sourced by start.sh and test-all.sh.

# Prints the directory holding PostgreSQL's server binaries (initdb, pg_ctl, postgres), newest first.
find_pg_bindir() {
  local dir
  for dir in $(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -t/ -k5 -V -r); do
    if [ -x "$dir/initdb" ] && [ -x "$dir/pg_ctl" ]; then echo "$dir"; return 0; fi
  done
  return 1
}

# ensure_packages pkg:probe … — each probe is a command that succeeds when the package is present.
ensure_packages() {
  local missing=() item pkg probe
  for item in "$@"; do
    pkg=${item%%:*}; probe=${item#*:}
    eval "$probe" >/dev/null 2>&1 || missing+=("$pkg")
  done
  [ ${#missing[@]} -eq 0 ] && return 0
  if [ "$(id -u)" -eq 0 ] && command -v apt-get >/dev/null 2>&1; then
    echo "ringdown: installing Debian packages: ${missing[*]}"
    DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null \
      || { echo "ringdown: apt-get install ${missing[*]} failed" >&2; return 1; }
  else
    echo "ringdown: missing Debian packages: ${missing[*]}" >&2
    echo "ringdown: install them with:  sudo apt-get install ${missing[*]}" >&2
    return 1
  fi
}

# The PDF report prints every script a name may contain: Noto Sans (Latin, Greek, Cyrillic and
# many more scripts) and Noto Sans CJK (Japanese, Chinese, Korean) from Debian.
ensure_server_packages() {
  ensure_packages 'postgresql:find_pg_bindir' 'redis-server:command -v redis-server' \
    'fonts-noto-core:test -f /usr/share/fonts/truetype/noto/NotoSans-Regular.ttf' \
    'fonts-noto-cjk:test -f /usr/share/fonts/opentype/noto/NotoSansCJK-Regular.ttc'
}

ensure_browser_packages() {
  ensure_packages 'chromium:test -x /usr/bin/chromium' 'poppler-utils:command -v pdftotext'
}

# Installs the npm dependencies when node_modules is missing or older than the lock file.
ensure_node_modules() {
  if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    echo "ringdown: installing npm packages (npm ci)"
    npm ci --include=dev --no-fund --no-audit --loglevel=error
  fi
}
