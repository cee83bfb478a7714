//! jointbook — checks the bolted and welded joints of small tube structures, writes the fabrication
//! sheet and audits the structure against its size rules.
//!
//! Map of the modules (data flows one way, top to bottom):
//! - [`units`]: quantities with units, parsed once at the edge, formatted in US or SI.
//! - [`standards`]: the design standards as pure functions, one per limit state, each citing its
//!   clause and equation.
//! - [`diag`]: located messages about bad input (file:line:column: key: message).
//! - [`catalogue`]: bolt, nut, washer, thread, section, material and electrode data.
//! - [`stackup`]: fastener stack-up geometry (grip, length, threads in shear planes, engagement).
//! - [`model`]: the model file read once, every name resolved, every problem located.
//! - [`checks`]: every limit state of every connection, as traceable records.
//! - [`report`]: the summary table, the full working and the JSON of the checks.
//! - [`audit`]: rule compliance of pieces and of the whole structure.
//! - [`sheet`]: the fabrication sheet, cut list, hardware lists and detail drawings.

pub mod audit;
pub mod catalogue;
pub mod checks;
pub mod diag;
pub mod model;
pub mod report;
pub mod sheet;
pub mod stackup;
pub mod standards;
pub mod units;
