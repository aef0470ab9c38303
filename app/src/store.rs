//! When the saved records are read and written: once at start (anything unreadable copied
//! aside or held in place, and reported), and on every change (a failure kept for the notice,
//! with the text, to try again). The page's state holds one [`Store`].

use crate::records::{Kind, Reading};
use crate::storage::{self, KeptCopy};
use leptos::prelude::*;

/// What the page knows about its saved data, and the storage sync. Every read and write of the
/// stored records goes through here (and [`crate::storage`] below it).
#[derive(Clone, Copy)]
pub struct Store {
    /// What the page found when it started (unreadable records, no storage), for the grower.
    pub notice: RwSignal<Option<String>>,
    /// Why the latest entries of each record could not be saved.
    errors: RwSignal<Vec<(Kind, String)>>,
    /// Records left under their own key because they could not be read nor copied aside: never
    /// saved over.
    held: RwSignal<Vec<Kind>>,
    /// The kept-aside copies (and held records), as listed on the page.
    pub kept: RwSignal<Vec<KeptCopy>>,
    /// The text last read or written under each record's key: the same text is not written twice.
    last: StoredValue<Vec<(Kind, String)>>,
    /// Texts that could not be written yet.
    pending: StoredValue<Vec<(Kind, String)>>,
    /// Records found unreadable at start: (which, held in place).
    found: StoredValue<Vec<(Kind, bool)>>,
    /// How closely this module reads a record it does not own ([`Kind::first_look`] in the
    /// plan module, [`Kind::problem`] in the workbench).
    reading: Reading,
}

impl Store {
    pub fn new(reading: Reading) -> Store {
        Store {
            reading,
            notice: RwSignal::new(None),
            errors: RwSignal::new(Vec::new()),
            held: RwSignal::new(Vec::new()),
            kept: RwSignal::new(Vec::new()),
            last: StoredValue::new(Vec::new()),
            pending: StoredValue::new(Vec::new()),
            found: StoredValue::new(Vec::new()),
        }
    }

    /// Adds `text` to the notice at the top of the page.
    pub fn say(&self, text: String) {
        self.notice.update(|n| match n {
            Some(old) if old.contains(&text) => {}
            Some(old) => *old = format!("{old} {text}"),
            None => *n = Some(text),
        });
    }

    fn remember(&self, kind: Kind, text: String) {
        self.last.update_value(|l| {
            l.retain(|(k, _)| *k != kind);
            l.push((kind, text));
        });
    }

    /// Reads one record. Anything not exactly readable is copied aside and reported; if the
    /// copy cannot be made the record is held in place. `None` means: start from the default.
    pub fn load<T>(&self, kind: Kind, read: fn(&str) -> Result<T, String>) -> Option<T> {
        let mut out = None;
        self.take(kind, &mut |raw| match read(raw) {
            Ok(v) => {
                out = Some(v);
                true
            }
            Err(_) => false,
        });
        out
    }

    /// Checks a record another module reads (by this module's [`Reading`]), so an unreadable
    /// one is kept aside (or held) and reported on the first screen.
    pub fn check(&self, kind: Kind) {
        let reading = self.reading;
        self.take(kind, &mut |raw| reading(kind, raw).is_ok());
    }

    /// [`Store::load`]'s work, once for every type: `read` says whether the text reads.
    fn take(&self, kind: Kind, read: &mut dyn FnMut(&str) -> bool) {
        let raw = match storage::get(kind.key()) {
            Ok(Some(raw)) => raw,
            Ok(None) => return,
            Err(e) => {
                self.say(format!(
                    "Saved entries cannot be read here: {}. What you enter now lasts only while this page is open: use “Download everything” to keep it.",
                    e.words()
                ));
                return;
            }
        };
        if read(&raw) {
            self.remember(kind, raw);
            return;
        }
        // Once the copy is made the original goes: the record's key is free for the module
        // that owns it, and the next start finds nothing new to report.
        let held = match storage::keep_aside(kind, &raw) {
            Ok(_) => {
                storage::remove(kind.key());
                crate::bridge::send(crate::bridge::KEPT_EVENT, kind.slug());
                false
            }
            Err(_) => true,
        };
        if held {
            self.held.update(|h| h.push(kind));
        }
        self.found.update_value(|f| f.push((kind, held)));
    }

    /// Tells, in one notice, which records could not be read and where they are now.
    pub fn report_found(&self) {
        let found = self.found.get_value();
        // (names, "it" or "they", "it is" or "they are") of the records found held or not.
        let names = |held: bool| {
            let words: Vec<&str> = found.iter().filter(|(_, h)| *h == held).map(|(k, _)| k.word()).collect();
            let one = words.len() == 1;
            (words.join(" and "), if one { "it" } else { "them" }, if one { "it is" } else { "they are" })
        };
        let (aside, _, is) = names(false);
        if !aside.is_empty() {
            self.say(format!(
                "Your saved {aside} could not be read, so the page starts afresh. Nothing is lost: {is} kept under “Saved data the page could not read” at the top of the page."
            ));
        }
        let (held, them, is) = names(true);
        if !held.is_empty() {
            self.say(format!(
                "Your saved {held} could not be read, and there is no room to copy {them} aside. {} where {} and the page will not save over {them}: download or delete {them} under “Saved data the page could not read” at the top of the page.",
                if is == "it is" { "It stays" } else { "They stay" },
                if is == "it is" { "it is" } else { "they are" },
            ));
        }
    }

    /// Lists the kept-aside copies again.
    pub fn refresh_kept(&self) {
        let held = self.held.get_untracked();
        self.kept.set(storage::kept_copies(&held, self.reading));
    }

    /// Whether a record is held in place (unreadable, not yet copied aside).
    pub fn is_held(&self, kind: Kind) -> bool {
        self.held.with_untracked(|h| h.contains(&kind))
    }

    /// Tries again to copy a held record aside, so the page may save under its key.
    fn release(&self, kind: Kind) -> Result<(), String> {
        let raw = match storage::get(kind.key()) {
            Ok(Some(raw)) if (self.reading)(kind, &raw).is_err() => raw,
            _ => {
                self.held.update(|h| h.retain(|k| *k != kind));
                return Ok(());
            }
        };
        match storage::keep_aside(kind, &raw) {
            Ok(_) => {
                self.held.update(|h| h.retain(|k| *k != kind));
                self.refresh_kept();
                Ok(())
            }
            Err(_) => {
                Err(format!("the unreadable copy of your saved {} is in the way: see above", kind.word()))
            }
        }
    }

    /// Writes a record's text under its key, unless the same text is there already. A failure
    /// is kept for the notice, with the text, which is tried again after the next save that
    /// works; the entries stay in memory.
    pub fn save(&self, kind: Kind, text: String) {
        if self.last.with_value(|l| l.iter().any(|(k, t)| *k == kind && *t == text)) {
            return;
        }
        if self.write(kind, text) {
            let waiting: Vec<(Kind, String)> =
                self.pending.with_value(|p| p.iter().filter(|(k, _)| *k != kind).cloned().collect());
            for (k, t) in waiting {
                self.write(k, t);
            }
        }
    }

    fn write(&self, kind: Kind, text: String) -> bool {
        let held = self.is_held(kind);
        let result = if held { self.release(kind) } else { Ok(()) }
            .and_then(|_| storage::set(kind.key(), &text).map_err(|e| e.words().to_string()));
        self.pending.update_value(|p| p.retain(|(k, _)| *k != kind));
        match result {
            Ok(()) => {
                self.remember(kind, text);
                if self.errors.with_untracked(|e| e.iter().any(|(k, _)| *k == kind)) {
                    self.errors.update(|e| e.retain(|(k, _)| *k != kind));
                }
                true
            }
            Err(why) => {
                self.pending.update_value(|p| p.push((kind, text)));
                let now = (kind, why);
                if !self.errors.with_untracked(|e| e.contains(&now)) {
                    self.errors.update(|e| {
                        e.retain(|(k, _)| *k != now.0);
                        e.push(now);
                    });
                }
                false
            }
        }
    }

    /// Why the latest entries are not saved, in words; `None` when everything is saved.
    pub fn unsaved(&self) -> Option<String> {
        self.errors.with(|e| {
            let first = e.first()?;
            let what = match e.len() {
                1 => format!("your latest {}", match first.0 {
                    Kind::Plan => "changes to the plan",
                    Kind::RunLog => "changes to the run log",
                    Kind::Library => "changes to the saved plans and stills",
                }),
                _ => "your latest changes".to_string(),
            };
            Some(format!(
                "Not saved: {what} ({}). They stay on this page while it is open: download everything to keep them.",
                first.1
            ))
        })
    }

    /// Deletes a kept-aside copy, or discards a held record; true if it is gone.
    pub fn delete(&self, key: &str) -> bool {
        let gone = storage::remove(key);
        if gone {
            self.held.update(|h| h.retain(|k| k.key() != key));
            // The next save may now go through: forget what was written so it is tried again.
            self.last.update_value(|l| l.retain(|(k, _)| k.key() != key));
        }
        self.refresh_kept();
        gone
    }
}
