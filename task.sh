#!/usr/bin/env bash
# Clearbore task runner. Each command installs what it needs that is missing.
#   ./task.sh app    build dist/clearbore.html and serve dist/ on http://127.0.0.1:${CLEARBORE_PORT:-8765}
#   ./task.sh test   every test: lints, native tests (physics, CLI), browser end-to-end tests
#   ./task.sh build  build dist/clearbore.html only
#   ./task.sh bench  measure the page budgets (size, load time, edit time on every tab) in headless Chromium,
#                    and the settling/Ergun sweep natively, in wasm and in Python fluids
#   ./task.sh long [filter…]  the long property-test profile: PROPTEST_CASES (default 10^6) cases per
#                    property of tests/domain.rs and tests/fuzz.rs, optimised, one test at a time
set -euo pipefail
cd "$(dirname "$0")"

say() { printf '\n== %s\n' "$*"; }

as_root() { if [ "$(id -u)" = 0 ]; then "$@"; else sudo "$@"; fi; }

setup_wasm() {
  if ! rustup target list --installed | grep -qx wasm32-unknown-unknown; then
    say "adding the wasm32-unknown-unknown target"
    rustup target add wasm32-unknown-unknown
  fi
  local want have
  want=$(awk '/^name = "wasm-bindgen"$/ { getline; gsub(/version = |"/, ""); print; exit }' Cargo.lock)
  have=$(wasm-bindgen --version 2>/dev/null | awk '{ print $2 }' || true)
  if [ "$have" != "$want" ]; then
    say "installing wasm-bindgen-cli $want (matches Cargo.lock; takes several minutes once)"
    cargo install wasm-bindgen-cli --version "$want"
  fi
}

setup_browser() {
  if ! command -v chromium >/dev/null || ! command -v chromedriver >/dev/null; then
    say "installing Chromium and ChromeDriver (Debian packages)"
    as_root apt-get update -q
    as_root apt-get install -y -q chromium chromium-driver
  fi
}

# Firefox ESR and WebKitGTK (Safari's engine) with their WebDriver servers, for the smoke tests
# in the other engines. geckodriver is not packaged by Debian: it is built from crates.io.
GECKODRIVER_VERSION=0.37.1
setup_other_browsers() {
  if ! command -v firefox-esr >/dev/null || ! command -v WebKitWebDriver >/dev/null || ! command -v Xvfb >/dev/null; then
    say "installing Firefox ESR, WebKitGTK's WebDriver and Xvfb (Debian packages)"
    as_root apt-get update -q
    as_root apt-get install -y -q firefox-esr webkit2gtk-driver xvfb xauth
  fi
  if [ "$(geckodriver --version 2>/dev/null | awk 'NR == 1 { print $2 }')" != "$GECKODRIVER_VERSION" ]; then
    say "building geckodriver $GECKODRIVER_VERSION from crates.io (takes several minutes once)"
    cargo install geckodriver --version "$GECKODRIVER_VERSION"
  fi
}

# axe-core (pinned in tests/browser-tools/package-lock.json), injected by the layout tests only.
setup_browser_tools() {
  if [ ! -f tests/browser-tools/node_modules/axe-core/axe.min.js ]; then
    say "installing the browser-test tools (npm ci: axe-core, pinned)"
    npm ci --prefix tests/browser-tools --no-audit --no-fund
  fi
}

build() {
  setup_wasm
  say "building the page (release, wasm32)"
  cargo build --release --target wasm32-unknown-unknown --bin clearbore
  rm -rf target/web && mkdir -p target/web dist
  wasm-bindgen --target web --no-typescript --out-dir target/web \
    target/wasm32-unknown-unknown/release/clearbore.wasm
  # No wasm-opt: Debian's binaryen 108 (wasm-opt -O3, with --all-features or with only the
  # features rustc emits) rewrites the externref table that wasm-bindgen's glue fills, and the
  # page then fails to start ("WebAssembly.Table.set(): function-typed object must be null").
  python3 - <<'PY'
# Inline the CSS, the JS glue and the wasm (gzip, then base64) into one self-contained HTML file.
import base64, gzip, pathlib
page = pathlib.Path("index.html").read_text()
style = pathlib.Path("public/style.css").read_text()
glue = pathlib.Path("target/web/clearbore.js").read_text()
wasm = base64.b64encode(gzip.compress(pathlib.Path("target/web/clearbore_bg.wasm").read_bytes(), 9, mtime=0)).decode()
for marker, text in (("/*@CLEARBORE_STYLE@*/", style), ("/*@CLEARBORE_GLUE@*/", glue), ("/*@CLEARBORE_WASM@*/", wasm)):
    assert page.count(marker) == 1, marker
    page = page.replace(marker, text)
pathlib.Path("dist/clearbore.html").write_text(page)
PY
  local bytes gz
  bytes=$(wc -c < dist/clearbore.html)
  gz=$(gzip -9 -c dist/clearbore.html | wc -c)
  say "dist/clearbore.html: $bytes bytes ($gz bytes gzip -9)"
}

case "${1:-}" in
  app)
    build
    port="${CLEARBORE_PORT:-8765}"
    say "open the file directly:  file://$PWD/dist/clearbore.html"
    say "or the local server:     http://127.0.0.1:$port/clearbore.html   (Ctrl-C stops it)"
    exec python3 -m http.server "$port" --bind 127.0.0.1 --directory dist
    ;;
  build)
    build
    ;;
  test)
    setup_browser
    setup_other_browsers
    say "lints (native and wasm32)"
    cargo clippy --all-targets --features e2e -- -D warnings
    setup_wasm
    cargo clippy --target wasm32-unknown-unknown --bin clearbore --lib -- -D warnings
    say "native tests: physics, case files, command line, doc examples"
    cargo test
    build
    say "browser end-to-end tests (headless Chromium, file://)"
    setup_browser_tools
    cargo test --features e2e --test browser --test layout --test keeping
    say "smoke tests in Firefox and WebKit (file://)"
    cargo test --features e2e --test engines
    ;;
  bench)
    setup_browser
    build
    if [ ! -x target/bench-venv/bin/python ] || ! target/bench-venv/bin/python -c 'import fluids' 2>/dev/null; then
      say "installing Python fluids 1.3.1 into target/bench-venv (for the sweep's comparison)"
      python3 -m venv target/bench-venv
      target/bench-venv/bin/pip install -q fluids==1.3.1
    fi
    say "page budgets and the sweep in wasm (headless Chromium)"
    status=0
    CLEARBORE_WASM_SWEEP_OUT="$PWD/target/sweep-wasm.json" cargo test --features e2e --test page_budget || status=1
    say "native timings and the sweep against fluids (bench profile: release at opt-level 3)"
    CLEARBORE_WASM_SWEEP_OUT="$PWD/target/sweep-wasm.json" CLEARBORE_FLUIDS_PYTHON="$PWD/target/bench-venv/bin/python" \
      cargo test --profile bench --test sweep_bench || status=1
    exit "$status"
    ;;
  long)
    shift
    cases="${PROPTEST_CASES:-1000000}"
    say "long property tests: $cases cases per property (profile robust, one thread)"
    cargo test --profile robust --test domain --test fuzz --no-run
    for filter in "${@:-}"; do
      for t in domain fuzz; do
        PROPTEST_CASES="$cases" cargo test --profile robust --test "$t" -- --test-threads 1 ${filter:+"$filter"}
      done
    done
    ;;
  *)
    sed -n '2,10p' "$0"
    exit 2
    ;;
esac
