//! The model: one description of the structure (project, nodes, members, connection details,
//! member forces) read from a TOML file and a forces CSV beside it, every name resolved against
//! the catalogue and every problem reported with its file, line, column and key.
//!
//! Reading is split by concern: [`schema`] reads the TOML tables, [`forces`] reads the member
//! forces, [`load`] ties them together with the catalogues and the cross-references.

pub mod chord;
pub mod forces;
pub mod load;
pub mod pieces;
pub mod reader;
pub mod rules;
pub mod schema;

use crate::catalogue::{
    BoltGrade, BoltType, Electrode, Material, Nut, NutGrade, Section, Thread, Tolerance, Washer,
};
use crate::stackup::StickoutRule;
use crate::standards::aisc360::j2_welds::FlareProcess;
use crate::standards::aisc360::j3_bolts::{HoleDeformation, HoleType, Threads};
use crate::standards::aisc360::Edition;
use crate::standards::Method;
use crate::units::{Angle, Force, Length, UnitSystem};

pub use load::{load, LoadOptions};

/// A model read and resolved: every name found in the catalogue, every reference checked.
#[derive(Debug, Clone)]
pub struct Model {
    /// The model file as named on the command line.
    pub file: String,
    pub project: Project,
    pub nodes: Vec<Node>,
    pub members: Vec<Member>,
    pub details: Vec<Detail>,
    pub forces: Vec<ForceRow>,
    /// The tube-size tolerances of the catalogue, for the fit of sleeves.
    pub tolerances: Vec<Tolerance>,
    /// The rule sets kept in the model (`[rules.NAME]`), for `jointbook audit`.
    pub rules: Vec<rules::RuleSet>,
    /// SHA-256 of the model file and the forces file, in hex, for the record.
    pub hash: String,
}

/// The project table.
#[derive(Debug, Clone)]
pub struct Project {
    pub title: String,
    pub client: Option<String>,
    pub revision: String,
    pub edition: Edition,
    pub method: Method,
    /// Factor applied to every member force before it is checked (1.0 for none).
    pub demand_factor: f64,
    pub units: UnitSystem,
    /// Whether deformation at the bolt holes at service load is a design consideration (J3.11).
    pub hole_deformation: HoleDeformation,
    /// Whether the directional strength increase of J2.4 may be used on fillet welds to tube
    /// walls (`weld_directional_increase`).
    pub weld_directional_increase: DirectionalIncrease,
    /// How far every bolt must reach past the outer face of its nut (`thread_past_nut`).
    pub thread_past_nut: ThreadPastNut,
    /// Greatest stick-out beyond the nut face the project allows (`max_stickout`), if any.
    pub max_stickout: Option<Length>,
    /// Spare loose hardware to order (`spares = { percent = 5, minimum = 1 }`), when given.
    pub spares: Option<Spares>,
}

/// The project's choice on the directional strength increase of AISC 360 J2.4 for fillet welds
/// to tube walls, and whether the model set it or the default (off) applies.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct DirectionalIncrease {
    pub on: bool,
    /// `false` when the model left the key out and the default (off) applies.
    pub set_by_model: bool,
}

impl DirectionalIncrease {
    pub fn as_str(self) -> &'static str {
        if self.on {
            "on"
        } else {
            "off"
        }
    }
}

/// The project's thread-past-the-nut rule and whether the model set it or the default applies.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ThreadPastNut {
    pub rule: StickoutRule,
    /// `false` when the model left the key out and the default (flush, RCSC 2020 §2.3.2) applies.
    pub set_by_model: bool,
}

/// The spares rule of the hardware order: a percentage of each item, rounded up, and a minimum.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Spares {
    pub percent: f64,
    pub minimum: u32,
}

/// A point of the structure.
#[derive(Debug, Clone)]
pub struct Node {
    pub id: String,
    pub at: [Length; 3],
}

/// A member between two nodes, with the connection detail at each end.
#[derive(Debug, Clone)]
pub struct Member {
    pub id: String,
    pub from: String,
    pub to: String,
    pub section: Section,
    pub material: Material,
    /// Detail id at the `from` end, or `None` where the end has no checked connection.
    pub start: Option<String>,
    /// Detail id at the `to` end.
    pub end: Option<String>,
    /// Node-to-node length.
    pub length: Length,
    /// Byte offset of the member's table in the model file, for messages.
    pub offset: usize,
    /// Line of the member's table in the model file (1-based), for messages after loading.
    pub line: usize,
    /// The piece mark painted on the fabricated piece (`mark`; the member id when not given).
    pub mark: String,
    /// The tube's cut length as the model gives it (`cut_length`), in place of the one worked out
    /// from the nodes and the set-backs.
    pub cut_length: Option<Length>,
    /// From the `from` node to the tube's cut end (`start_setback`), in place of the detail's.
    pub start_setback: Option<Length>,
    /// From the `to` node to the tube's cut end (`end_setback`), in place of the detail's.
    pub end_setback: Option<Length>,
    /// Turn of the section about the member axis (`roll`), as the audit geometry defines it.
    pub roll: Option<Angle>,
    /// Surface finish of the piece (`coating`), `None` when not stated.
    pub coating: Option<Coating>,
    /// Vent and drain holes in the tube (`[[members.ID.vent_holes]]`).
    pub vent_holes: Vec<VentHole>,
}

/// The surface finish of a piece.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Coating {
    /// Hot-dip galvanized after fabrication: closed hollow parts need vent and drain holes.
    Galvanized,
    Painted,
    Bare,
}

impl Coating {
    pub fn as_str(self) -> &'static str {
        match self {
            Coating::Galvanized => "galvanized",
            Coating::Painted => "painted",
            Coating::Bare => "bare",
        }
    }
}

/// Where along the tube a vent or drain hole is.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum HoleAt {
    /// Near the `from` end.
    Start,
    /// Near the `to` end.
    End,
    /// Away from both ends.
    Between,
}

/// A vent or drain hole drilled in the tube wall.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct VentHole {
    pub at: HoleAt,
    pub diameter: Length,
}

/// Which end of a member.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum End {
    Start,
    End,
}

impl End {
    pub fn as_str(self) -> &'static str {
        match self {
            End::Start => "start",
            End::End => "end",
        }
    }
}

/// A reusable connection detail.
#[derive(Debug, Clone)]
pub struct Detail {
    pub id: String,
    pub bolts: Bolting,
    pub kind: DetailKind,
    /// From the node to the tube's cut end along the member axis (`setback`), when given.
    pub setback: Option<Length>,
    /// Line of the detail's table in the model file (1-based), for messages after loading.
    pub line: usize,
}

/// The shape of a connection.
#[derive(Debug, Clone)]
pub enum DetailKind {
    /// A plate tab welded into a slot in the member end and bolted in lap to one or two mating
    /// plates (a gusset, or a pair of splice plates).
    Tab(TabDetail),
    /// A tube or bar slid into the member end and bolted through both walls of both parts.
    Sleeve(SleeveDetail),
    Tapped(TappedDetail),
}

impl DetailKind {
    pub fn name(&self) -> &'static str {
        match self {
            DetailKind::Tab(_) => "tab",
            DetailKind::Sleeve(_) => "sleeve",
            DetailKind::Tapped(_) => "tapped",
        }
    }
}

/// The bolts of a detail, with their hardware, resolved from the catalogue.
#[derive(Debug, Clone)]
pub struct Bolting {
    pub grade: BoltGrade,
    pub thread: Thread,
    pub bolt_type: BoltType,
    /// The nut and its grade; none for a tapped detail, whose plug takes the nut's place.
    pub nut: Option<Nut>,
    pub nut_grade: Option<NutGrade>,
    pub washer: Option<Washer>,
    /// Bolt lines across the force (always 1 in a sleeve).
    pub across: u32,
    /// Bolts in each line, in line with the force.
    pub along: u32,
    /// Spacing of bolts in line with the force, centre to centre (needed when along > 1).
    pub pitch: Option<Length>,
    /// Spacing of bolt lines across the force (needed when across > 1).
    pub gauge: Option<Length>,
    pub hole: HoleType,
    /// Hole size set by the user in place of Table J3.3.
    pub hole_override: Option<Length>,
    /// Thread condition in the shear planes as the user states it; `None` means not stated.
    pub threads: Option<Threads>,
    /// Bolt length fixed by the detail (`length`); `None`: chosen from the bolt type's series.
    pub length: Option<Length>,
    /// Where the washers of type `washer` go (`washers`).
    pub washers: WasherPlacement,
    /// Which ply the bolt head bears on (`head_side`), where the stack is not symmetric.
    pub head_side: Option<HeadSide>,
}

/// Where a detail's washers go.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum WasherPlacement {
    None,
    UnderHead,
    UnderNut,
    UnderHeadAndNut,
}

impl WasherPlacement {
    pub fn under_head(self) -> bool {
        matches!(
            self,
            WasherPlacement::UnderHead | WasherPlacement::UnderHeadAndNut
        )
    }
    pub fn under_nut(self) -> bool {
        matches!(
            self,
            WasherPlacement::UnderNut | WasherPlacement::UnderHeadAndNut
        )
    }
}

/// The ply under the bolt head in a tab lapped to one mating plate (the side the bolt enters).
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum HeadSide {
    Tab,
    Mate,
}

impl Bolting {
    pub fn count(&self) -> u32 {
        self.across * self.along
    }
}

/// A plate tab at the member end.
#[derive(Debug, Clone)]
pub struct TabDetail {
    pub tab: TabPlate,
    pub mate: MatePlate,
    pub weld: TabWeld,
    /// Where the mate is shop-welded to the face of a chord tube (`[details.ID.on_chord]`);
    /// none: the mate's support is not modelled and the mate belongs to no piece.
    pub on_chord: Option<Box<OnChord>>,
}

/// How the tab is joined to the tube: in a slot with four fillets, or lapped on one face of a
/// rectangular tube with a flare-bevel groove weld along each edge, where the edge meets the
/// tube's rounded corner (`weld.joint`).
#[derive(Debug, Clone)]
pub enum TabWeld {
    Slot(SlotWeld),
    FlareBevel(FlareBevelWeld),
}

impl TabWeld {
    /// Length of each weld line (the tab's length in the slot, or its lap on the face).
    pub fn length(&self) -> Length {
        match self {
            TabWeld::Slot(w) => w.length,
            TabWeld::FlareBevel(w) => w.length,
        }
    }

    pub fn electrode(&self) -> &Electrode {
        match self {
            TabWeld::Slot(w) => &w.electrode,
            TabWeld::FlareBevel(w) => &w.electrode,
        }
    }
}

/// The mate as a plate shop-welded to the face of a chord member, at the node the member end
/// using the detail connects to.
#[derive(Debug, Clone)]
pub struct OnChord {
    /// The chord members the mate may be welded to (`chord = "ID"`, or `chords = [...]`): at each
    /// member end the one whose line passes through the end's node.
    pub chords: Vec<ChordRef>,
    /// The plate's plane along the chord axis or across it (`plate`).
    pub plate: ChordPlate,
    /// The plate's welded length along the chord (`lb`); none: the mate's width (longitudinal).
    pub lb: Option<Length>,
    /// The fillet welds of the plate to the chord face.
    pub weld: ChordWeld,
}

/// One chord member named by `on_chord`, with where it is written, for messages.
#[derive(Debug, Clone)]
pub struct ChordRef {
    pub id: String,
    /// Byte offset of the value in the model file and its key path.
    pub offset: usize,
    pub key: String,
}

impl OnChord {
    /// The ids of the chords, joined for a message ("BC1 or BC2").
    pub fn names(&self) -> String {
        self.chords
            .iter()
            .map(|c| c.id.as_str())
            .collect::<Vec<_>>()
            .join(" or ")
    }

    /// The length of each fillet line along the plate's welded edge: `lb` (else the mate's width)
    /// for a longitudinal plate, the mate's width across the chord for a transverse one.
    pub fn welded_length(&self, mate: &MatePlate) -> Length {
        match self.plate {
            ChordPlate::Longitudinal => self.lb.unwrap_or(mate.width),
            ChordPlate::Transverse => mate.width,
        }
    }
}

/// The two flare-bevel groove welds of a tab lapped on a tube face as wide as the tab, filled
/// flush: one along each edge of the tab, in the groove between the tab and the tube's corner.
#[derive(Debug, Clone)]
pub struct FlareBevelWeld {
    /// Length of each of the two weld lines (the tab's lap on the face).
    pub length: Length,
    pub electrode: Electrode,
    /// The welding process, which sets the effective throat (Table J2.2).
    pub process: FlareProcess,
}

/// How a plate on a chord face is turned.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum ChordPlate {
    /// Plate plane along the chord axis, in the plane of the chord and the member (a gusset).
    Longitudinal,
    /// Plate plane across the chord axis; the member is square to the chord.
    Transverse,
}

impl ChordPlate {
    pub fn as_str(self) -> &'static str {
        match self {
            ChordPlate::Longitudinal => "longitudinal",
            ChordPlate::Transverse => "transverse",
        }
    }
}

/// The fillet welds of a mate to a chord face: one line along the welded edge on each welded
/// side of the plate.
#[derive(Debug, Clone)]
pub struct ChordWeld {
    pub size: Length,
    pub electrode: Electrode,
    /// 1 (one side of the plate) or 2 (both sides).
    pub sides: u32,
}

/// The tab plate itself.
#[derive(Debug, Clone)]
pub struct TabPlate {
    pub thickness: Length,
    pub width: Length,
    pub material: Material,
    /// From the bolt nearest the tab's free end to that end, along the force.
    pub end_distance: Length,
    /// From the bolt nearest the tube to the tube end: the tab's free length outside the tube.
    pub clear_length: Length,
    /// Effective length factor of the free length, for the tab in compression (J4.4).
    pub k: f64,
}

/// The plate(s) the tab is bolted to.
#[derive(Debug, Clone)]
pub struct MatePlate {
    pub thickness: Length,
    pub width: Length,
    pub material: Material,
    /// From the bolt nearest the member to the mate's edge on the member's side.
    pub end_distance: Length,
    /// From the bolt farthest from the member to the mate's edge on the far side.
    pub back_distance: Length,
    /// One mating plate (single shear) or two, either side of the tab (double shear).
    pub count: u32,
    /// The mate's unbraced length in compression and its effective length factor, for J4.4;
    /// `None` when the model does not give them (the check is then listed as not checked).
    pub free_length: Option<FreeLength>,
}

/// An unbraced (free) length of a plate in compression with its effective length factor K,
/// both stated in the model (no default K).
#[derive(Debug, Clone, Copy)]
pub struct FreeLength {
    /// From the bolt row nearest the mate's support to the line where the mate is held.
    pub length: Length,
    /// Effective length factor K of that length.
    pub k: f64,
}

/// The fillet welds of a tab in a slotted tube end: four lines, along both faces of the tab at
/// both slotted walls.
#[derive(Debug, Clone)]
pub struct SlotWeld {
    pub size: Length,
    /// Length of each of the four weld lines (the tab's insertion into the slot).
    pub length: Length,
    pub electrode: Electrode,
    /// Width of the slot less the tab thickness (fit-up gap); the slot is cut tab + gap wide.
    pub slot_gap: Length,
}

/// A sleeve slid into the member end and through-bolted.
#[derive(Debug, Clone)]
pub struct SleeveDetail {
    pub section: Section,
    pub material: Material,
    /// How far the sleeve reaches into this member.
    pub insertion: Length,
    /// From the member end to the nearest bolt.
    pub end_distance: Length,
    /// Height of the weld seam inside the member ("0 in" when removed or seamless).
    pub inside_seam: Length,
    /// The band of total clearance (outside of sleeve to inside of member) the fit must stay in;
    /// none: the common-practice defaults.
    pub clearance_min: Option<Length>,
    pub clearance_max: Option<Length>,
    /// The least insertion the designer asks for; none: the common-practice default.
    pub min_insertion: Option<Length>,
    /// The sleeve's whole length (`length`), when given.
    pub length: Option<Length>,
    /// Which of the two members the sleeve is welded into in the shop (`welded_into`).
    pub welded_into: Option<End>,
}

/// A plug welded all round into or onto the member end, with a tapped hole on the member's axis:
/// one screw passes through the plate under its head (a gusset) and screws into the plug.
#[derive(Debug, Clone)]
pub struct TappedDetail {
    /// The plate clamped between the screw head and the plug.
    pub plate: ClampedPlate,
    pub plug: Plug,
    pub weld: EndWeld,
}

/// The plate under the screw head.
#[derive(Debug, Clone)]
pub struct ClampedPlate {
    pub thickness: Length,
    pub material: Material,
}

/// The part carrying the tapped hole.
#[derive(Debug, Clone)]
pub struct Plug {
    pub material: Material,
    /// Thickness of the plug along the member axis (the depth the hole is tapped through).
    pub thickness: Length,
    /// Length of full thread engaged between screw and plug; at most the thickness.
    pub engagement: Length,
}

/// The fillet weld all round the member end joining it to the plug.
#[derive(Debug, Clone)]
pub struct EndWeld {
    pub size: Length,
    pub electrode: Electrode,
}

/// One member force of one load case, with where it was read.
#[derive(Debug, Clone)]
pub struct ForceRow {
    pub member: String,
    pub case: String,
    /// Axial force, tension positive, before the demand factor.
    pub axial: Force,
    /// "file:line" where the row was read.
    pub origin: String,
}
