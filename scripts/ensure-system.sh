#!/usr/bin/env bash
# Installs the Debian packages Margin needs when they are missing:
#   mariadb   – the database server (mariadbd, mariadb-install-db, mariadb-admin)
#   r         – R with the boot package, for the reference tests
#   chromium  – the browser the Playwright tests drive
#   scipy     – Python's SciPy, only for the benchmark
# Usage: scripts/ensure-system.sh mariadb [r] [chromium] [scipy]
set -euo pipefail

need=()
for what in "$@"; do
  case "$what" in
    mariadb) command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ] || need+=(mariadb-server mariadb-client) ;;
    r) { command -v Rscript >/dev/null 2>&1 && Rscript -e 'quit(status = !(requireNamespace("boot", quietly = TRUE) && requireNamespace("MASS", quietly = TRUE)))' >/dev/null 2>&1; } || need+=(r-base-core r-cran-boot r-cran-mass) ;;
    chromium) [ -x /usr/bin/chromium ] || need+=(chromium) ;;
    scipy) /usr/bin/python3 -c 'import scipy' >/dev/null 2>&1 || need+=(python3-scipy) ;;
    *) echo "ensure-system: unknown component '$what'" >&2; exit 2 ;;
  esac
done

if [ ${#need[@]} -eq 0 ]; then exit 0; fi

if [ "$(id -u)" -ne 0 ]; then
  echo "ensure-system: missing packages ${need[*]}; run as root or install them: apt-get install -y ${need[*]}" >&2
  exit 1
fi
echo "installing Debian packages: ${need[*]}"
export DEBIAN_FRONTEND=noninteractive
apt-get update -qq
apt-get install -y -qq --no-install-recommends "${need[@]}" >/dev/null
echo "installed: ${need[*]}"
