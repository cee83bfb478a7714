//! The `jointbook` command line: parses arguments, calls the library, prints, sets the exit code.
//! Exit codes: 0 every check passes (warnings allowed), 1 some check fails, 2 the input is wrong.

use clap::{Parser, Subcommand, ValueEnum};
use jointbook::catalogue::{listing, Catalogue};
use jointbook::checks::{check_model, Status};
use jointbook::diag::Diagnostic;
use jointbook::model::{load, LoadOptions};
use jointbook::report::{json, text, text::Colour};
use jointbook::units::UnitSystem;
use std::io::{IsTerminal, Write};
use std::path::{Path, PathBuf};
use std::process::ExitCode;

#[derive(Parser)]
#[command(
    name = "jointbook",
    version,
    about = "Checks the bolted and welded joints of small tube structures against AISC 360.",
    long_about = "Checks the bolted and welded joints of small tube structures against AISC 360.\n\n\
        Results are an aid to design: a qualified, licensed engineer reviews them; local codes and the \
        engineer of record govern."
)]
struct Cli {
    #[command(subcommand)]
    command: Command,
}

#[derive(Clone, Copy, ValueEnum)]
enum Format {
    Table,
    Json,
}

#[derive(Clone, Copy, ValueEnum)]
enum Units {
    Us,
    Si,
}

#[derive(Subcommand)]
enum Command {
    /// Check every connection of a model.
    #[command(after_help = "Examples:\n  \
        jointbook check examples/quillon-brook-footbridge/model.toml\n  \
        jointbook check model.toml --format json > results.json\n  \
        jointbook check model.toml --explain BC1/end --units si")]
    Check {
        /// The model file (TOML).
        model: PathBuf,
        /// Output format.
        #[arg(long, value_enum, default_value = "table")]
        format: Format,
        /// Units of the output, in place of the model's.
        #[arg(long, value_enum)]
        units: Option<Units>,
        /// Show every check of one connection (MEMBER/start or MEMBER/end), or of the project (`project`), with its working.
        #[arg(long, value_name = "CONNECTION")]
        explain: Option<String>,
        /// An extra catalogue file, read after those the model names (may be repeated).
        #[arg(long = "catalogue", value_name = "FILE")]
        catalogues: Vec<PathBuf>,
        /// Write the output to this file instead of standard output.
        #[arg(long, value_name = "FILE")]
        output: Option<PathBuf>,
        /// Replace the output file if it exists (with --output).
        #[arg(long, requires = "output")]
        overwrite: bool,
    },
    /// Write the fabrication sheet, cut list, hardware lists and detail drawings into a folder.
    #[command(
        after_help = "Writes sheet.html, sheet.md, detail-ID.svg for each detail, cutlist.csv, \
        hardware.csv and kits.csv into DIR, all at once.\n\
        Exit codes: 0 no check fails, 1 a check fails (the sheet is still written, failures listed first), \
        2 the input is wrong or DIR is not empty (nothing written).\n\n\
        Examples:\n  \
        jointbook sheet examples/quillon-brook-footbridge/model.toml --out sheet\n  \
        jointbook sheet model.toml --out sheet --force --units si"
    )]
    Sheet {
        /// The model file (TOML).
        model: PathBuf,
        /// The folder to write; refused if it holds files, unless --force.
        #[arg(long, value_name = "DIR")]
        out: PathBuf,
        /// Write into a folder that holds files, replacing the sheet's own files and removing the drawings of an earlier sheet it does not write (other files are kept).
        #[arg(long)]
        force: bool,
        /// Units of the sheet, in place of the model's.
        #[arg(long, value_enum)]
        units: Option<Units>,
        /// A folder of templates (sheet.html, sheet.md, sheet.css) replacing the built-in ones.
        #[arg(long, value_name = "DIR")]
        templates: Option<PathBuf>,
        /// An extra catalogue file, read after those the model names (may be repeated).
        #[arg(long = "catalogue", value_name = "FILE")]
        catalogues: Vec<PathBuf>,
    },
    /// Audit the pieces and the structure against rule sets: piece box, piece weight, envelope,
    /// clear zones, connection kinds, fastener variety, vent holes of galvanized pieces.
    #[command(
        after_help = "Every rule set of the model and the rules file is audited unless some are named.\n\n\
        Examples:\n  \
        jointbook audit examples/quillon-brook-footbridge/model.toml\n  \
        jointbook audit model.toml --rules kettle --rules hand-carry\n  \
        jointbook audit model.toml --rules-file trailer.toml --format json --output audit.json"
    )]
    Audit {
        /// The model file (TOML).
        model: PathBuf,
        /// A rule set to audit, by name (may be repeated; default: every set).
        #[arg(long = "rules", value_name = "NAME")]
        rules: Vec<String>,
        /// A file of `[rules.NAME]` tables, read beside the model's own.
        #[arg(long, value_name = "FILE")]
        rules_file: Option<PathBuf>,
        /// Output format.
        #[arg(long, value_enum, default_value = "table")]
        format: Format,
        /// Write the output to this file instead of standard output.
        #[arg(long, value_name = "FILE")]
        output: Option<PathBuf>,
        /// Replace the output file if it exists (with --output).
        #[arg(long, requires = "output")]
        overwrite: bool,
    },
    /// List, search and show catalogue entries.
    #[command(after_help = "Examples:\n  \
        jointbook catalogue list sections\n  \
        jointbook catalogue search A325\n  \
        jointbook catalogue show \"HSS2x2x1/8\" --units si")]
    Catalogue {
        #[command(subcommand)]
        action: CatalogueAction,
        /// An extra catalogue file to read (may be repeated).
        #[arg(long = "catalogue", value_name = "FILE", global = true)]
        catalogues: Vec<PathBuf>,
    },
}

#[derive(Subcommand)]
enum CatalogueAction {
    /// List the entries of one kind, or the kinds and their counts.
    List {
        /// bolt_grade, nut_grade, bolt_type, thread, nut, washer, section, material, electrode, gauge, tolerance
        kind: Option<String>,
    },
    /// Find entries whose name or standard contains a text.
    Search { text: String },
    /// Show one entry with its properties and sources.
    Show {
        name: String,
        #[arg(long, value_enum, default_value = "us")]
        units: Units,
    },
}

fn unit_system(u: Units) -> UnitSystem {
    match u {
        Units::Us => UnitSystem::Us,
        Units::Si => UnitSystem::Si,
    }
}

fn report_errors(diags: &[Diagnostic]) -> ExitCode {
    let mut err = std::io::stderr().lock();
    for d in diags {
        let _ = writeln!(err, "error: {d}");
    }
    let _ = writeln!(
        err,
        "{} problem{} found; nothing was written.",
        diags.len(),
        if diags.len() == 1 { "" } else { "s" }
    );
    ExitCode::from(2)
}

/// Print to standard output; a closed pipe is a normal end.
fn print(s: &str) {
    let mut out = std::io::stdout().lock();
    if let Err(e) = out.write_all(s.as_bytes()).and_then(|_| out.flush()) {
        if e.kind() != std::io::ErrorKind::BrokenPipe {
            eprintln!("error: cannot write the output: {e}");
        }
    }
}

/// Write a whole file at once (through a temporary file beside it), refusing to replace one.
fn write_output(path: &Path, content: &str, overwrite: bool) -> Result<(), Diagnostic> {
    let shown = path.display().to_string();
    if path.exists() && !overwrite {
        return Err(
            Diagnostic::file(&shown, "--output", "the file exists and was left as it was")
                .hint("choose another name, or add --overwrite to replace it"),
        );
    }
    if path.is_dir() {
        return Err(Diagnostic::file(
            &shown,
            "--output",
            "this is a folder, not a file; nothing was written",
        )
        .hint("give a file name inside it, e.g. `--output report.txt`"));
    }
    let tmp = path.with_extension("jointbook-tmp");
    std::fs::write(&tmp, content)
        .and_then(|_| std::fs::rename(&tmp, path))
        .map_err(|e| {
            let _ = std::fs::remove_file(&tmp);
            let d = Diagnostic::file(&shown, "--output", format!("cannot write the file: {e}"));
            match path.parent().filter(|p| !p.as_os_str().is_empty()) {
                Some(dir) if !dir.is_dir() => d.hint(format!(
                    "the folder '{}' does not exist: create it first, or name a file in a folder that does",
                    dir.display()
                )),
                _ => d.hint("check that the folder is writable"),
            }
        })
}

fn colour() -> Colour {
    if std::env::var_os("NO_COLOR").is_some_and(|v| !v.is_empty())
        || !std::io::stdout().is_terminal()
    {
        Colour::Off
    } else {
        Colour::On
    }
}

fn run_check(
    model: &Path,
    format: Format,
    units: Option<Units>,
    explain: Option<String>,
    catalogues: Vec<PathBuf>,
    output: Option<PathBuf>,
    overwrite: bool,
) -> ExitCode {
    let model = match load(model, &LoadOptions { catalogues }) {
        Ok(m) => m,
        Err(diags) => return report_errors(&diags),
    };
    let report = check_model(&model);
    let units = units.map(unit_system).unwrap_or(model.project.units);
    let colour = if output.is_some() {
        Colour::Off
    } else {
        colour()
    };
    let content = match (&explain, format) {
        (Some(id), Format::Table) if id == "project" => {
            text::explain_project(&model, &report, units, colour)
        }
        (Some(id), Format::Json) if id == "project" => format!(
            "{}\n",
            serde_json::to_string_pretty(&json::document(&model, &report, units)["project_checks"])
                .unwrap_or_default()
        ),
        (Some(id), _) => match report.connections.iter().find(|c| &c.id == id) {
            Some(c) => match format {
                Format::Table => text::explain(&model, c, units, colour),
                Format::Json => {
                    let doc = json::document(&model, &report, units);
                    let one = doc["connections"]
                        .as_array()
                        .and_then(|a| a.iter().find(|c| c["id"] == id.as_str()))
                        .cloned()
                        .unwrap_or_default();
                    format!(
                        "{}\n",
                        serde_json::to_string_pretty(&one).unwrap_or_default()
                    )
                }
            },
            None => {
                let ids: Vec<&str> = report.connections.iter().map(|c| c.id.as_str()).collect();
                let near = jointbook::diag::nearest(id, ids.iter().copied());
                let d = Diagnostic::file(&model.file, "--explain", format!("no connection '{id}'"))
                    .hint(match near.first() {
                        Some(n) => format!(
                            "did you mean '{n}'? connections are named MEMBER/start and MEMBER/end"
                        ),
                        None => "connections are named MEMBER/start and MEMBER/end (or `project` for the project checks)".into(),
                    });
                return report_errors(&[d]);
            }
        },
        (None, Format::Table) => text::summary(&model, &report, colour),
        (None, Format::Json) => format!(
            "{}\n",
            serde_json::to_string_pretty(&json::document(&model, &report, units))
                .unwrap_or_default()
        ),
    };
    match output {
        Some(path) => {
            if let Err(d) = write_output(&path, &content, overwrite) {
                return report_errors(&[d]);
            }
        }
        None => print(&content),
    }
    if report.status() == Status::Fail {
        ExitCode::from(1)
    } else {
        ExitCode::SUCCESS
    }
}

fn run_catalogue(action: CatalogueAction, files: Vec<PathBuf>) -> ExitCode {
    let mut cat = match Catalogue::embedded() {
        Ok(c) => c,
        Err(d) => return report_errors(&d),
    };
    for f in &files {
        let name = f.display().to_string();
        let text = match std::fs::read_to_string(f) {
            Ok(t) => t,
            Err(e) => {
                return report_errors(&[Diagnostic::file(
                    &name,
                    "--catalogue",
                    format!("cannot read the file: {e}"),
                )])
            }
        };
        if let Err(d) = cat.merge_user_file(&name, &text) {
            return report_errors(&d);
        }
    }
    let out = match action {
        CatalogueAction::List { kind } => match listing::list(&cat, kind.as_deref()) {
            Ok(s) => s,
            Err(d) => return report_errors(&[d]),
        },
        CatalogueAction::Search { text } => {
            let found = listing::search(&cat, &text);
            if found.trim().is_empty() {
                eprintln!(
                    "no catalogue entry matches '{text}' (see `jointbook catalogue list` for the kinds)"
                );
            }
            found
        }
        CatalogueAction::Show { name, units } => {
            match listing::show(&cat, &name, unit_system(units)) {
                Ok(s) => s,
                Err(e) => {
                    let d = Diagnostic::file("(catalogue)", "name", e.to_string())
                        .hint("see `jointbook catalogue search TEXT`");
                    return report_errors(&[d]);
                }
            }
        }
    };
    print(&out);
    ExitCode::SUCCESS
}

fn main() -> ExitCode {
    let cli = Cli::parse();
    match cli.command {
        Command::Check {
            model,
            format,
            units,
            explain,
            catalogues,
            output,
            overwrite,
        } => run_check(
            &model, format, units, explain, catalogues, output, overwrite,
        ),
        Command::Sheet {
            model,
            out,
            force,
            units,
            templates,
            catalogues,
        } => {
            let opts = jointbook::sheet::SheetOptions {
                units: units.map(unit_system).unwrap_or_default(),
                templates,
            };
            match jointbook::sheet::run(&model, &out, force, units.is_some(), opts, catalogues) {
                Ok(w) => {
                    let drawings = w.files.iter().filter(|f| f.ends_with(".svg")).count();
                    let others: Vec<&str> = w
                        .files
                        .iter()
                        .filter(|f| !f.ends_with(".svg"))
                        .map(String::as_str)
                        .collect();
                    let text = format!(
                        "wrote {} files into {}: {} and {drawings} drawing{}\n{} The sheet lists every failing check and every warning first; open {} to read or print it.\n\nCAUTION: {}\n",
                        w.files.len(),
                        out.display(),
                        others.join(", "),
                        if drawings == 1 { "" } else { "s" },
                        w.tally,
                        out.join("sheet.html").display(),
                        jointbook::report::CAUTION
                    );
                    print(&text);
                    match w.status {
                        Status::Fail => ExitCode::from(1),
                        _ => ExitCode::SUCCESS,
                    }
                }
                Err(diags) => report_errors(&diags),
            }
        }
        Command::Catalogue { action, catalogues } => run_catalogue(action, catalogues),
        Command::Audit {
            model,
            rules,
            rules_file,
            format,
            output,
            overwrite,
        } => {
            let request = jointbook::report::audit::AuditRequest {
                model,
                rule_sets: rules,
                rules_file,
                json: matches!(format, Format::Json),
            };
            let colour = if output.is_some() {
                Colour::Off
            } else {
                colour()
            };
            match jointbook::report::audit::run(&request, colour) {
                Err(diags) => report_errors(&diags),
                Ok((content, failed)) => {
                    match output {
                        Some(path) => {
                            if let Err(d) = write_output(&path, &content, overwrite) {
                                return report_errors(&[d]);
                            }
                        }
                        None => print(&content),
                    }
                    ExitCode::from(u8::from(failed))
                }
            }
        }
    }
}
