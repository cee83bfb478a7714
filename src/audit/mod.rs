//! Rule audit: piece box, piece weight, structure envelope, clear zones, connection rules.
//!
//! - [`piece_box`]: best-fitting box of a piece over an orientation search, against a box limit.
//! - [`result`]: the record every rule returns ([`AuditResult`]) and the input error.
//! - [`weight`]: piece weight from tube, attachments, weld metal and hardware; structure total.
//! - [`clear_zone`]: signed clearance of members to zones kept clear.
//! - [`connections`]: allowed connection kinds, bolt end past the nut, distinct fastener items.
//! - [`envelope`]: overall extents of the structure against least and greatest sizes.
//! - [`galvanizing`]: vent and drain openings of closed hollow parts.
//! - [`run`]: the audit of a model against its chosen rule sets, piece by piece.
//! - [`geometry`]: points, frames and the solids of a piece (tube as cut, attachments as boxes).

pub mod clear_zone;
pub mod connections;
pub mod envelope;
pub mod galvanizing;
pub mod geometry;
pub mod piece_box;
pub mod result;
pub mod run;
pub mod weight;

pub use crate::units::Quantity;
pub use geometry::{extent, Frame, MemberSolid, OrientedBox, Point3, Roll, Section, Solid, Vec3};
pub use result::{AuditInputError, AuditResult, AuditStatus};
pub use run::{audit, AuditReport, RuleSetResults};
