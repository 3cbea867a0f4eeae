#!/usr/bin/env bash
# Shared steps of the start and test commands: Debian packages and npm packages.

# Installs the Debian packages given when their command is missing (needs root, as on these machines).
ensure_apt() {
  local missing=()
  while [ $# -gt 0 ]; do
    local cmd="$1" pkg="$2"; shift 2
    if ! command -v "$cmd" >/dev/null 2>&1 && [ ! -x "/usr/sbin/$cmd" ]; then missing+=("$pkg"); fi
  done
  [ ${#missing[@]} -eq 0 ] && return 0
  if [ "$(id -u)" -ne 0 ]; then
    echo "Missing Debian packages: ${missing[*]}. Install them as root: apt-get update && apt-get install -y ${missing[*]}" >&2
    exit 1
  fi
  echo "Installing Debian packages: ${missing[*]}"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null
}

# npm ci when node_modules is missing or older than the lockfile (always under CI).
ensure_node_modules() {
  if [ "${CI:-}" = "true" ] || [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    echo "Installing npm packages (npm ci)..."
    npm ci --no-audit --no-fund --loglevel=error
  fi
}

# A secret for signing session cookies, made once per checkout and kept in the git-ignored data folder.
ensure_secret() {
  mkdir -p .data
  if [ ! -s .data/nextauth-secret ]; then head -c 32 /dev/urandom | base64 > .data/nextauth-secret; fi
  cat .data/nextauth-secret
}
