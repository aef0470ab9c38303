//! Entry point of the first-still module: the page loads it when the mode is first opened and it
//! mounts the mode's view into the page's `#first-still-root`.

fn main() {
    stillroom_app::components::first_still::mount();
}
