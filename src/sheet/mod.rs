//! The fabrication sheet: `sheet.html` (printable) and `sheet.md` rendered through templates, one
//! SVG drawing per detail, and the cut list, hardware order and per-connection kits as CSV.
//!
//! The parts: [`format`] writes numbers for the shop, [`cutlist`], [`hardware`] and [`svg`]
//! make the lists and drawings, [`context`] gathers everything a template sees, [`templates`]
//! holds the embedded templates (a user's folder can replace any of them) and [`write`] puts
//! the files in place atomically. Nothing here decides whether a joint is good: the checks do.

pub mod context;
pub mod cutlist;
pub mod format;
pub mod hardware;
pub mod svg;
pub mod templates;
pub mod write;

use crate::checks::fasteners::{fastener_sets, FastenerSet};
use crate::checks::Report;
use crate::diag::Diagnostic;
use crate::model::pieces::{group_by_mark, pieces};
use crate::model::Model;
use crate::units::UnitSystem;
use hardware::{KitLine, OrderLine, SparesRule};
use std::collections::BTreeMap;
use std::path::PathBuf;
use write::OutFile;

/// What the command line sets for a sheet.
#[derive(Debug, Clone)]
pub struct SheetOptions {
    pub units: UnitSystem,
    /// A folder whose templates replace the embedded ones of the same name.
    pub templates: Option<PathBuf>,
}

/// The file names of the sheet, fixed so scripts can find them.
pub const HTML: &str = "sheet.html";
pub const MARKDOWN: &str = "sheet.md";
pub const CUTLIST: &str = "cutlist.csv";
pub const HARDWARE: &str = "hardware.csv";
pub const KITS: &str = "kits.csv";

fn csv_error(e: impl std::fmt::Display, file: &str) -> Diagnostic {
    Diagnostic::file(file, "csv", format!("cannot write the list: {e}"))
}

fn csv_bytes<F>(file: &str, header: &[&str], fill: F) -> Result<Vec<u8>, Diagnostic>
where
    F: FnOnce(&mut csv::Writer<Vec<u8>>) -> csv::Result<()>,
{
    let mut w = csv::WriterBuilder::new()
        .terminator(csv::Terminator::Any(b'\n'))
        .from_writer(Vec::new());
    w.write_record(header).map_err(|e| csv_error(e, file))?;
    fill(&mut w).map_err(|e| csv_error(e, file))?;
    w.into_inner().map_err(|e| csv_error(e, file))
}

fn cutlist_csv(rows: &[cutlist::CutRow], mm: &[f64]) -> Result<Vec<u8>, Diagnostic> {
    csv_bytes(
        CUTLIST,
        &[
            "mark",
            "section",
            "material",
            "cut_length",
            "cut_length_mm",
            "cut_basis",
            "start_cut",
            "end_cut",
            "quantity",
            "weight_each",
            "weight_with_attachments",
            "attachments",
            "members",
            "not_included",
        ],
        |w| {
            for (r, l) in rows.iter().zip(mm) {
                w.write_record([
                    r.mark.as_str(),
                    &r.section,
                    &r.material,
                    &r.cut_length,
                    &format::trim_decimals(*l, 1),
                    &r.cut_basis,
                    &r.start_cut,
                    &r.end_cut,
                    &r.quantity.to_string(),
                    &r.weight_each,
                    &r.weight_with_attachments,
                    &r.attachments,
                    &r.members,
                    &r.not_included,
                ])?;
            }
            Ok(())
        },
    )
}

const ITEM_COLUMNS: [&str; 7] = [
    "item", "product", "grade", "size", "thread", "length", "finish",
];

fn item_fields(i: &hardware::Item) -> [&str; 7] {
    [
        i.kind.as_str(),
        &i.product,
        &i.grade,
        &i.size,
        &i.thread,
        &i.length,
        &i.finish,
    ]
}

fn hardware_csv(order: &[OrderLine]) -> Result<Vec<u8>, Diagnostic> {
    let mut header = ITEM_COLUMNS.to_vec();
    header.extend(["quantity", "spares", "order"]);
    csv_bytes(HARDWARE, &header, |w| {
        for o in order {
            let mut rec: Vec<String> = item_fields(&o.item).iter().map(|s| s.to_string()).collect();
            rec.extend([o.quantity, o.spares, o.order].map(|n| n.to_string()));
            w.write_record(&rec)?;
        }
        Ok(())
    })
}

fn kits_csv(kits: &[KitLine]) -> Result<Vec<u8>, Diagnostic> {
    let mut header = vec!["connection", "member", "end", "detail"];
    header.extend(ITEM_COLUMNS);
    header.push("quantity");
    csv_bytes(KITS, &header, |w| {
        for k in kits {
            let mut rec: Vec<String> = [&k.connection, &k.member, &k.end, &k.detail]
                .iter()
                .map(|s| s.to_string())
                .collect();
            rec.extend(item_fields(&k.item).iter().map(|s| s.to_string()));
            rec.push(k.quantity.to_string());
            w.write_record(&rec)?;
        }
        Ok(())
    })
}

/// The drawing of each detail, its stack as at the first connection using it.
fn drawings(model: &Model, sets: &[FastenerSet], units: UnitSystem) -> BTreeMap<String, String> {
    model
        .details
        .iter()
        .map(|d| {
            let set = sets.iter().find(|f| f.detail == d.id);
            (d.id.clone(), svg::detail_drawing(model, d, units, set))
        })
        .collect()
}

/// Render every file of the sheet. Problems of the model that the sheet needs (a piece whose cut
/// length is unknown, a template that does not render) are errors: nothing is written.
pub fn render(
    model: &Model,
    report: &Report,
    options: &SheetOptions,
    spares: SparesRule,
) -> Result<Vec<OutFile>, Vec<Diagnostic>> {
    let units = options.units;
    let pieces = pieces(model)?;
    let groups = group_by_mark(model, &pieces)?;
    let fasteners = fastener_sets(model);
    let kits = hardware::kits(model, &fasteners);
    let order = hardware::order(&kits, spares);
    let cut_rows = cutlist::rows(&groups, units);
    let mm: Vec<f64> = groups.iter().map(|g| g.piece.cut_length.to_mm()).collect();
    let drawings = drawings(model, &fasteners, units);
    let mut hardware_notes = vec![format!(
        "Spares: {} % of each item rounded up, at least {} of each.",
        format::trim_decimals(spares.percent, 2),
        spares.minimum
    )];
    if order
        .iter()
        .any(|o| o.item.finish == hardware::FINISH_NOT_GIVEN)
    {
        hardware_notes
            .push("The catalogue gives no finish for the washers: state it on the order (to match the bolts and nuts).".into());
    }
    hardware_notes.push(
        "The model has no way to mark a bolt as fitted in the shop: every item is loose field hardware."
            .into(),
    );
    if order
        .iter()
        .any(|o| o.item.length == hardware::LENGTH_NOT_CHOSEN)
    {
        hardware_notes.push(
            "Bolt lengths are not chosen for every connection: the order is not complete.".into(),
        );
    }
    let cutlist_notes = cutlist::left_out_notes(&pieces);
    let parts = context::Parts {
        units,
        fasteners: &fasteners,
        order: &order,
        cutlist: cut_rows.clone(),
        cutlist_notes,
        hardware_notes,
        pieces: groups.iter().map(|g| g.quantity as u32).sum(),
        drawings: &drawings,
    };
    let ctx = context::build(model, report, parts);
    let env = templates::environment(options.templates.clone());
    let folder = options.templates.as_deref();
    let html = templates::render(&env, folder, HTML, &ctx)?;
    let md = templates::render(&env, folder, MARKDOWN, &ctx)?;
    let mut files = vec![
        OutFile {
            name: HTML.into(),
            bytes: html.into_bytes(),
        },
        OutFile {
            name: MARKDOWN.into(),
            bytes: md.into_bytes(),
        },
    ];
    for (id, svg) in &drawings {
        files.push(OutFile {
            name: context::svg_file(id),
            bytes: svg.clone().into_bytes(),
        });
    }
    files.push(OutFile {
        name: CUTLIST.into(),
        bytes: cutlist_csv(&cut_rows, &mm).map_err(|d| vec![d])?,
    });
    files.push(OutFile {
        name: HARDWARE.into(),
        bytes: hardware_csv(&order).map_err(|d| vec![d])?,
    });
    files.push(OutFile {
        name: KITS.into(),
        bytes: kits_csv(&kits).map_err(|d| vec![d])?,
    });
    Ok(files)
}

/// The `sheet` command: read the model, check it, render the sheet and write the folder. The
/// units are the model's unless `units_given`. Returns the checks' status (the sheet is written
/// even when a check fails); any input problem or a refused folder writes nothing.
pub fn run(
    model_path: &std::path::Path,
    out: &std::path::Path,
    force: bool,
    units_given: bool,
    mut options: SheetOptions,
    catalogues: Vec<PathBuf>,
) -> Result<Written, Vec<Diagnostic>> {
    let model = crate::model::load(model_path, &crate::model::LoadOptions { catalogues })?;
    if !units_given {
        options.units = model.project.units;
    }
    let out_shown = out.display().to_string();
    if out.is_dir()
        && !force
        && std::fs::read_dir(out)
            .map(|mut d| d.next().is_some())
            .unwrap_or(false)
    {
        return Err(vec![Diagnostic::file(
            &out_shown,
            "--out",
            "the folder is not empty; nothing was written",
        )
        .hint(
            "choose an empty or new folder, or add --force to replace the sheet's files in it",
        )]);
    }
    if let Some(dir) = &options.templates {
        templates::check_folder(dir)?;
    }
    let report = crate::checks::check_model(&model);
    let files = render(
        &model,
        &report,
        &options,
        model
            .project
            .spares
            .map(SparesRule::from)
            .unwrap_or_default(),
    )?;
    write::write_folder(out, &files, force).map_err(|e| {
        let d = Diagnostic::file(&out_shown, "--out", e.to_string());
        vec![match e {
            write::WriteError::NotEmpty(_) => {
                d.hint("choose an empty or new folder, or add --force")
            }
            _ => d,
        }]
    })?;
    Ok(Written {
        status: report.status(),
        files: files.iter().map(|f| f.name.clone()).collect(),
        tally: crate::report::text::tally(&report),
    })
}

/// What `run` wrote: the checks' overall status, the file names, and the count of connections
/// by status, for the command line to say.
pub struct Written {
    pub status: crate::checks::Status,
    pub files: Vec<String>,
    pub tally: String,
}
