//! Entry point: in the browser (wasm32) it mounts the page; natively it evaluates case files.
#![forbid(unsafe_code)]

#[cfg(target_arch = "wasm32")]
fn main() {
    clearbore::ui::mount();
}

#[cfg(not(target_arch = "wasm32"))]
fn main() -> std::process::ExitCode {
    clearbore::cli::main()
}
