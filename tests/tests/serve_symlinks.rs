//! The static server reads nothing outside its folder: not through `..`, escapes, or symlinks.

mod serve_http;

use serve_http::{get, small_site, temp_dir};
use std::os::unix::fs::symlink;
use xtask::serve::Server;

#[test]
fn symlinks_leading_out_of_the_folder_are_not_followed() {
    let site = small_site("confined");
    let outside = temp_dir("outside");
    std::fs::write(outside.join("secret.txt"), "not for the web").unwrap();
    std::fs::write(outside.join("secret.js"), "const leaked = 1;").unwrap();
    std::fs::create_dir_all(outside.join("dir")).unwrap();
    std::fs::write(outside.join("dir").join("index.html"), "<p>outside</p>").unwrap();

    symlink(outside.join("secret.txt"), site.join("secret.txt")).unwrap();
    symlink(&outside, site.join("elsewhere")).unwrap();
    symlink(outside.join("dir"), site.join("dir")).unwrap();
    symlink("/etc/passwd", site.join("passwd")).unwrap();
    // A relative link climbing out.
    symlink("../../../../../../../../etc/hostname", site.join("host")).unwrap();
    // A compressed copy that points out: the real file must be sent instead.
    symlink(outside.join("secret.js"), site.join("app.js.br")).unwrap();
    // A link that stays inside is fine.
    symlink("style.css", site.join("alias.css")).unwrap();

    let s = Server::start(&site).unwrap();
    for path in [
        "/secret.txt",
        "/elsewhere/secret.txt",
        "/elsewhere/dir/index.html",
        "/dir/",
        "/dir/index.html",
        "/passwd",
        "/host",
        "/../outside/secret.txt",
        "/%2e%2e/%2e%2e/etc/passwd",
        "/..%2f..%2fetc%2fpasswd",
        "/a%5c..%5c..%5cetc%5cpasswd",
    ] {
        let r = get(s.addr(), path, &[]);
        assert_eq!(r.status(), 404, "{path}: {r:?}");
        let body = String::from_utf8_lossy(&r.body);
        assert!(
            !body.contains("not for the web") && !body.contains("outside") && !body.contains("root:"),
            "{path}"
        );
    }
    let js = get(s.addr(), "/app.js", &["Accept-Encoding: br"]);
    assert_eq!(js.status(), 200);
    assert_eq!(js.header("content-encoding"), None, "{js:?}");
    assert_eq!(js.body, std::fs::read(site.join("app.js")).unwrap());
    let alias = get(s.addr(), "/alias.css", &[]);
    assert_eq!(alias.status(), 200);
    assert_eq!(alias.body, std::fs::read(site.join("style.css")).unwrap());

    std::fs::remove_dir_all(&site).unwrap();
    std::fs::remove_dir_all(&outside).unwrap();
}
