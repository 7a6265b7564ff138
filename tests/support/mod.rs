//! Shared by the browser tests and the page benchmark: starts a WebDriver server and its browser
//! with networking cut off — ChromeDriver with headless Chromium (the main suite), geckodriver
//! with headless Firefox, or WebKitWebDriver with WebKitGTK's MiniBrowser on a virtual X
//! display (Safari's engine) — and opens the built single-file page from `file://`.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic, dead_code)]

use std::net::TcpListener;
use std::path::PathBuf;
use std::time::Duration;

use fantoccini::{Client, ClientBuilder, Locator};
use serde_json::{Value, json};
use tokio::process::{Child, Command};

/// The built page; `./task.sh build` makes it.
pub fn page_path() -> PathBuf {
    PathBuf::from(env!("CARGO_MANIFEST_DIR")).join("dist/clearbore.html")
}

/// A browser session driven through its own WebDriver process.
pub struct Browser {
    /// The WebDriver client.
    pub client: Client,
    engine: Engine,
    _driver: Child,
    _display: Option<Child>,
    _profile: tempdir::Dir,
}

/// The browser engines the page is tested in.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Engine {
    /// Chromium (Blink), headless.
    Chromium,
    /// Firefox ESR (Gecko), headless.
    Firefox,
    /// WebKitGTK's MiniBrowser (WebKit, the engine of Safari) on a virtual X display.
    WebKit,
}

/// WebKitGTK's browser for automation (Debian's libwebkit2gtk-4.1-0).
const MINIBROWSER: &str = "/usr/lib/x86_64-linux-gnu/webkit2gtk-4.1/MiniBrowser";

mod tempdir {
    /// A throw-away folder removed on drop.
    pub struct Dir(pub std::path::PathBuf);
    impl Drop for Dir {
        fn drop(&mut self) {
            let _ = std::fs::remove_dir_all(&self.0);
        }
    }
}

fn free_port() -> u16 {
    TcpListener::bind("127.0.0.1:0").unwrap().local_addr().unwrap().port()
}

impl Browser {
    /// Starts ChromeDriver and Chromium. Every request to the network goes to a dead proxy on
    /// loopback, so the page is tested as it runs offline.
    pub async fn start() -> Browser {
        Self::start_scaled(1.0).await
    }

    /// As [`Browser::start`], with the screen's device pixel ratio forced to `scale`.
    pub async fn start_scaled(scale: f64) -> Browser {
        Self::launch(Engine::Chromium, scale).await
    }

    /// Starts `engine` (at device pixel ratio 1).
    pub async fn start_engine(engine: Engine) -> Browser {
        Self::launch(engine, 1.0).await
    }

    async fn launch(engine: Engine, scale: f64) -> Browser {
        let page = page_path();
        assert!(page.exists(), "{} is missing: run ./task.sh build first", page.display());
        let port = free_port();
        let dead_proxy = free_port();
        let profile = std::env::temp_dir().join(format!("clearbore-browser-{port}"));
        std::fs::create_dir_all(&profile).unwrap();
        let quiet = |c: &mut Command| {
            c.stdout(std::process::Stdio::null()).stderr(std::process::Stdio::null()).kill_on_drop(true);
        };
        let mut display = None;
        let (driver, caps) = match engine {
            Engine::Chromium => {
                let mut c = Command::new("chromedriver");
                c.arg(format!("--port={port}"));
                quiet(&mut c);
                let caps = json!({
                    "goog:chromeOptions": {
                        "binary": "/usr/bin/chromium",
                        "args": [
                            "--headless=new", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage",
                            "--disable-background-networking", "--disable-component-update", "--no-first-run",
                            "--disable-sync", "--disable-quic", "--window-size=1280,1400",
                            format!("--force-device-scale-factor={scale}"),
                            format!("--user-data-dir={}", profile.display()),
                            format!("--proxy-server=http://127.0.0.1:{dead_proxy}"), "--proxy-bypass-list=<-loopback>",
                        ]
                    }
                });
                (c.spawn().expect("chromedriver not found: install chromium-driver (./task.sh test does)"), caps)
            }
            Engine::Firefox => {
                let mut c = Command::new("geckodriver");
                c.arg(format!("--port={port}"));
                quiet(&mut c);
                let caps = json!({
                    "browserName": "firefox",
                    "moz:firefoxOptions": {
                        "binary": "/usr/bin/firefox-esr",
                        "args": ["-headless", "-width=1280", "-height=1400", "-profile", profile.display().to_string()],
                        "prefs": {
                            "network.proxy.type": 1,
                            "network.proxy.http": "127.0.0.1",
                            "network.proxy.http_port": dead_proxy,
                            "network.proxy.ssl": "127.0.0.1",
                            "network.proxy.ssl_port": dead_proxy,
                            "app.update.enabled": false,
                            "browser.shell.checkDefaultBrowser": false,
                            "datareporting.policy.dataSubmissionEnabled": false,
                            "toolkit.telemetry.enabled": false,
                        }
                    }
                });
                (c.spawn().expect("geckodriver not found: ./task.sh test installs it"), caps)
            }
            Engine::WebKit => {
                // A virtual X display of its own (WebKitGTK has no headless mode of its own here).
                let number = 100 + port % 800;
                let mut x = Command::new("Xvfb");
                x.args([format!(":{number}"), "-screen".to_owned(), "0".to_owned(), "1280x1400x24".to_owned(), "-nolisten".to_owned(), "tcp".to_owned()]);
                quiet(&mut x);
                display = Some(x.spawn().expect("Xvfb not found: install xvfb (./task.sh test does)"));
                tokio::time::sleep(Duration::from_millis(500)).await;
                let mut c = Command::new("WebKitWebDriver");
                c.arg(format!("--port={port}")).env("DISPLAY", format!(":{number}"));
                quiet(&mut c);
                let caps = json!({
                    "browserName": "MiniBrowser",
                    "webkitgtk:browserOptions": { "binary": MINIBROWSER, "args": ["--automation"] },
                    "proxy": { "proxyType": "manual", "httpProxy": format!("127.0.0.1:{dead_proxy}"), "sslProxy": format!("127.0.0.1:{dead_proxy}") },
                });
                (c.spawn().expect("WebKitWebDriver not found: install webkit2gtk-driver (./task.sh test does)"), caps)
            }
        };
        let Value::Object(caps) = caps else { unreachable!() };
        let url = format!("http://127.0.0.1:{port}");
        let mut last_error = String::new();
        for _ in 0..150 {
            match ClientBuilder::rustls().expect("rustls").capabilities(caps.clone()).connect(&url).await {
                Ok(client) => {
                    if engine != Engine::Chromium {
                        let _ = client.set_window_size(1280, 1400).await;
                    }
                    // Scripts that walk every choice of every tab run for tens of seconds on a
                    // loaded two-core machine; WebDriver's default script timeout is 30 s.
                    let timeouts = fantoccini::wd::TimeoutConfiguration::new(Some(std::time::Duration::from_secs(180)), None, None);
                    client.update_timeouts(timeouts).await.expect("script timeout set");
                    return Browser { client, engine, _driver: driver, _display: display, _profile: tempdir::Dir(profile) };
                }
                Err(e) => last_error = e.to_string(),
            }
            tokio::time::sleep(Duration::from_millis(100)).await;
        }
        panic!("could not start a {engine:?} session: {last_error}");
    }

    /// Opens the single-file page from `file://` and waits until the app has mounted.
    pub async fn open_page(&self) {
        let url = format!("file://{}", page_path().display());
        self.client.goto(&url).await.unwrap();
        self.wait_for("[data-testid=result-residence_time]").await;
    }

    /// Waits (up to 10 s) for an element to exist.
    pub async fn wait_for(&self, css: &str) {
        self.client
            .wait()
            .at_most(Duration::from_secs(10))
            .for_element(Locator::Css(css))
            .await
            .unwrap_or_else(|e| panic!("{css} did not appear: {e}"));
    }

    /// Text of the element matching `css`: its rendered text, or for an element folded away
    /// (a closed `<details>`) its text content, trimmed.
    pub async fn text(&self, css: &str) -> String {
        let el = self.client.find(Locator::Css(css)).await.unwrap_or_else(|e| panic!("{css}: {e}"));
        let t = self
            .client
            .execute("const e = arguments[0]; return e.innerText.trim() || e.textContent.replace(/\\s+/g, ' ').trim();", vec![serde_json::to_value(&el).unwrap()])
            .await
            .unwrap();
        t.as_str().unwrap_or_default().to_owned()
    }

    /// Whether an element matching `css` exists.
    pub async fn exists(&self, css: &str) -> bool {
        !self.client.find_all(Locator::Css(css)).await.unwrap().is_empty()
    }

    /// Polls (up to 5 s) until the value `script` returns satisfies `ok` (for what the page does a
    /// moment after an edit: saving, the map); returns it.
    pub async fn js_when(&self, script: &str, ok: impl Fn(&Value) -> bool) -> Value {
        self.js_within(script, ok, 50).await
    }

    /// As [`Browser::js_when`], polling `tries` times, 100 ms apart (for work the page does over
    /// seconds, such as a map filled in cell by cell).
    pub async fn js_within(&self, script: &str, ok: impl Fn(&Value) -> bool, tries: u32) -> Value {
        let mut last = Value::Null;
        for _ in 0..tries {
            last = self.js(script).await;
            if ok(&last) {
                return last;
            }
            tokio::time::sleep(std::time::Duration::from_millis(100)).await;
        }
        panic!("{script} gave {last}");
    }

    /// Polls (up to 5 s) until the text of `css` satisfies `ok`; returns the last text seen.
    pub async fn text_when(&self, css: &str, ok: impl Fn(&str) -> bool) -> String {
        let mut last = String::new();
        for _ in 0..100 {
            if let Ok(el) = self.client.find(Locator::Css(css)).await
                && let Ok(t) = self.client.execute("const e = arguments[0]; return e.innerText.trim() || e.textContent.replace(/\\s+/g, ' ').trim();", vec![serde_json::to_value(&el).unwrap()]).await
                && let Some(t) = t.as_str().map(str::to_owned)
            {
                if ok(&t) {
                    return t;
                }
                last = t;
            }
            tokio::time::sleep(Duration::from_millis(50)).await;
        }
        panic!("{css}: text never met the condition; last seen {last:?}");
    }

    /// Types `text` into the input with `data-testid=input-<key>`, replacing what was there, as a
    /// user would (select all, then type).
    pub async fn type_into(&self, key: &str, text: &str) {
        let el = self.client.find(Locator::Css(&format!("[data-testid=input-{key}]"))).await.unwrap();
        el.clear().await.unwrap();
        el.send_keys(text).await.unwrap();
    }

    /// Chooses the option with `value` in the select with `data-testid=<testid>`.
    pub async fn choose(&self, testid: &str, value: &str) {
        let el = self.client.find(Locator::Css(&format!("[data-testid=\"{testid}\"]"))).await.unwrap();
        el.select_by_value(value).await.unwrap();
    }

    /// Clicks the element matching `css`.
    pub async fn click(&self, css: &str) {
        self.client.find(Locator::Css(css)).await.unwrap().click().await.unwrap();
    }

    /// Runs JavaScript in the page and returns its value.
    pub async fn js(&self, script: &str) -> Value {
        self.client.execute(script, vec![]).await.unwrap()
    }

    /// Sets the page's viewport to `width` × `height` CSS pixels. In Chromium the viewport itself
    /// is set (DevTools' device metrics): a headless window is never narrower than about 500 px,
    /// so a window of 390 px would have shown the page at 500. Elsewhere the window's outer size.
    pub async fn resize(&self, width: u32, height: u32) {
        if self.engine == Engine::Chromium {
            self.client.set_window_size(width.max(600), height).await.unwrap();
            let scale = self.js("return window.devicePixelRatio;").await.as_f64().unwrap_or(1.0);
            self.devtools("Emulation.setDeviceMetricsOverride", json!({ "width": width, "height": height, "deviceScaleFactor": scale, "mobile": false })).await;
            tokio::time::sleep(Duration::from_millis(150)).await;
            let inner = self.js("return window.innerWidth;").await.as_f64().unwrap();
            assert_eq!(inner, f64::from(width), "the viewport did not take the width");
        } else {
            self.client.set_window_size(width, height).await.unwrap();
            tokio::time::sleep(Duration::from_millis(150)).await;
        }
    }

    /// Runs a Chromium DevTools command (chromedriver's `goog/cdp/execute`); returns its result.
    pub async fn devtools(&self, cmd: &str, params: Value) -> Value {
        self.client.issue_cmd(DevTools { cmd: cmd.to_owned(), params }).await.unwrap()
    }

    /// Saves a screenshot under `target/screenshots/` for a person to look at.
    pub async fn screenshot(&self, name: &str) {
        let dir = PathBuf::from(env!("CARGO_MANIFEST_DIR")).join("target/screenshots");
        std::fs::create_dir_all(&dir).unwrap();
        let png = self.client.screenshot().await.unwrap();
        std::fs::write(dir.join(format!("{name}.png")), png).unwrap();
    }

    /// Saves a screenshot of the element matching `css` under `target/screenshots/`.
    pub async fn screenshot_of(&self, css: &str, name: &str) {
        let dir = PathBuf::from(env!("CARGO_MANIFEST_DIR")).join("target/screenshots");
        std::fs::create_dir_all(&dir).unwrap();
        let png = self.client.find(Locator::Css(css)).await.unwrap().screenshot().await.unwrap();
        std::fs::write(dir.join(format!("{name}.png")), png).unwrap();
    }

    /// Asserts what a clean page reports about itself: no CSP violation (blocked request), no
    /// console error, no network resource request, no panic banner, no boot error.
    pub async fn assert_clean(&self) {
        let log = self
            .js("return { v: window.__clearboreLog.violations, e: window.__clearboreLog.errors, \
                 r: performance.getEntriesByType('resource').map(e => e.name) };")
            .await;
        assert_eq!(log["v"], Value::Array(vec![]), "CSP violations (blocked requests)");
        assert_eq!(log["e"], Value::Array(vec![]), "console errors");
        assert_eq!(log["r"], Value::Array(vec![]), "network resource requests");
        assert!(!self.exists("[data-testid=panic-banner]").await, "panic banner shown");
        assert!(!self.exists("[data-testid=boot-error]").await, "boot error shown");
    }

    /// Ends the session.
    pub async fn close(self) {
        let _ = self.client.close().await;
    }
}

/// A Chromium DevTools command sent through chromedriver.
#[derive(Debug)]
struct DevTools {
    cmd: String,
    params: Value,
}

impl fantoccini::wd::WebDriverCompatibleCommand for DevTools {
    fn endpoint(&self, base_url: &url::Url, session_id: Option<&str>) -> Result<url::Url, url::ParseError> {
        base_url.join(&format!("session/{}/goog/cdp/execute", session_id.unwrap_or_default()))
    }

    fn method_and_body(&self, _request_url: &url::Url) -> (http::Method, Option<String>) {
        (http::Method::POST, Some(json!({ "cmd": self.cmd, "params": self.params }).to_string()))
    }
}
