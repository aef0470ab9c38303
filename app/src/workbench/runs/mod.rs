//! The grower's log of finished runs as batch records, and what they say about the next run:
//! the form (`form.rs`), the list with delete, undo and print (`list.rs`), the calibration
//! (`calibrate.rs`), export and import (`transfer.rs`), the log's own rules (`log.rs`).

mod calibrate;
mod form;
mod list;
pub mod log;
mod transfer;

use super::Workbench;
use crate::bridge;
use crate::records::{self, Kind, RunsRecord};
use leptos::prelude::*;
use stillroom_core::calibration::RunRecord;

/// The log of finished runs, saved under [`Kind::RunLog`]'s key.
#[derive(Clone, Copy)]
pub struct Runs {
    /// Oldest first, as logged.
    pub runs: RwSignal<Vec<RunRecord>>,
    /// The grower's pattern for lot numbers (empty: the page's).
    pub lot_pattern: RwSignal<String>,
    /// What the last import or hand-over added, in words.
    pub merged: RwSignal<Option<String>>,
}

impl Runs {
    /// Reads the saved log (anything unreadable kept aside, and reported by the workbench once
    /// every part has loaded), keeps it saved, and
    /// takes in run logs the plan hands over (now and whenever it announces one).
    pub fn new(wb: Workbench) -> Runs {
        let store = wb.store;
        let logged = store.load(Kind::RunLog, records::read_runs).unwrap_or_default();
        let mut list = logged.runs;
        log::fill_missing_lots(&mut list, &logged.lot_pattern);
        let runs = Runs {
            runs: RwSignal::new(list),
            lot_pattern: RwSignal::new(logged.lot_pattern),
            merged: RwSignal::new(None),
        };
        Effect::new(move |_| {
            let text = runs.lot_pattern.with(|p| runs.runs.with(|r| records::runs_text(r, p)));
            store.save(Kind::RunLog, text);
        });
        runs.take_handed_over();
        let inbox = window_event_listener_untyped(bridge::INBOX_EVENT, move |_| runs.take_handed_over());
        on_cleanup(move || inbox.remove());
        runs
    }

    /// Merges a run-log record text like an import; says what it added, or why it could not.
    pub fn merge_text(&self, text: &str) -> Result<String, String> {
        let read: RunsRecord = records::read_runs(text)?;
        let mut incoming = read.runs;
        log::fill_missing_lots(&mut incoming, &self.lot_pattern.get_untracked());
        let mut outcome = log::Merged::default();
        self.runs.update(|list| outcome = log::merge(list, incoming));
        Ok(outcome.words())
    }

    /// Adds `incoming` runs without overwriting (see [`log::merge`]); (added, skipped).
    pub fn merge(&self, mut incoming: Vec<RunRecord>) -> (usize, usize) {
        log::fill_missing_lots(&mut incoming, &self.lot_pattern.get_untracked());
        let mut outcome = log::Merged::default();
        self.runs.update(|list| outcome = log::merge(list, incoming));
        (outcome.added, outcome.skipped)
    }

    /// The run logs waiting in the inbox (only this part's kind; the others stay queued).
    fn take_handed_over(&self) {
        for text in bridge::take_inbox_of(bridge::INBOX_RUNLOG) {
            let said = match self.merge_text(&text) {
                Ok(words) => format!("From the kept copy: {words}"),
                Err(why) => format!("A run log handed over could not be read: {why}."),
            };
            self.merged.set(Some(said));
        }
    }
}

/// The log: the batch-record form, the calibration, the list, export and import.
#[component]
pub fn RunLog() -> impl IntoView {
    view! {
        <section class="runlog" aria-labelledby="h-runlog">
            <h2 id="h-runlog">"Your runs"</h2>
            <p class="hint">"Log each finished run as a batch record: the plan learns your crop's real oil content and recovery rate from them."</p>
            <form::BatchForm />
            <calibrate::CalibrationPanel />
            <list::RunList />
            <transfer::Transfer />
        </section>
    }
}
