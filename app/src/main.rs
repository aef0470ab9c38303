//! Entry point of the wasm page: mount the root component into `<body>`.

fn main() {
    leptos::mount::mount_to_body(stillroom_app::App);
}
