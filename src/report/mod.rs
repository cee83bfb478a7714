//! Rendering the check results: a summary table per connection, the full working of one
//! connection, and the stable JSON document for scripts; the table and JSON of the rule audit.

pub mod audit;
pub mod json;
pub mod text;

/// The caution every check output carries.
pub const CAUTION: &str =
    "jointbook is an aid to design, not a substitute for it. Every result must be reviewed by a \
qualified, licensed engineer; local codes and the engineer of record govern.";
