//! Entry point of the workbench module: the page loads it when the workbench tab is first opened
//! (or a share link or a kept-aside copy is opened) and it mounts into `#workbench-root`.

fn main() {
    stillroom_app::workbench::mount();
}
