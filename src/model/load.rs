//! Reading a model end to end: the TOML file, the catalogues it names, the forces, and the
//! cross-references between them. Every problem of the run is collected; any problem means no
//! model.

use super::reader::{Source, Table};
use super::{forces, schema, ForceRow, Member, Model};
use crate::catalogue::Catalogue;
use crate::diag::{nearest, Diagnostic};
use sha2::{Digest, Sha256};
use std::collections::{BTreeMap, BTreeSet};
use std::path::{Path, PathBuf};

/// What the command line adds to the model file.
#[derive(Debug, Clone, Default)]
pub struct LoadOptions {
    /// Catalogue files given on the command line, read after those the model names.
    pub catalogues: Vec<PathBuf>,
}

/// Read a file as UTF-8 text, or say why not.
fn read_text(path: &Path, shown: &str, key: &str) -> Result<String, Diagnostic> {
    let bytes = std::fs::read(path).map_err(|e| {
        Diagnostic::file(shown, key, format!("cannot read the file: {e}"))
            .hint("check the path; relative paths in a model are taken from the model's folder")
    })?;
    String::from_utf8(bytes).map_err(|e| {
        let offset = e.utf8_error().valid_up_to();
        let text = String::from_utf8_lossy(&e.into_bytes()[..offset]).into_owned();
        let (line, column) = crate::diag::line_column(&text, offset);
        let mut d = Diagnostic::file(shown, key, "the file is not UTF-8 text");
        d.line = line;
        d.column = column;
        d.hint("save the file as UTF-8")
    })
}

/// Read and resolve the model at `path`.
pub fn load(path: &Path, options: &LoadOptions) -> Result<Model, Vec<Diagnostic>> {
    let shown = path.display().to_string();
    let text = read_text(path, &shown, "model").map_err(|d| vec![d])?;
    if text.trim().is_empty() {
        let mut d = Diagnostic::file(&shown, "project", "the model file is empty")
            .hint("start from the demo model in examples/ (see README, 'The model file')");
        d.line = 1;
        d.column = 1;
        return Err(vec![d]);
    }
    let doc = toml_edit::ImDocument::parse(text.as_str())
        .map_err(|e| vec![toml_error(&shown, &text, &e)])?;
    let src = Source::new(&shown, &text);
    let root = Table::root(&src, doc.as_table());
    let dir = path.parent().map(Path::to_path_buf).unwrap_or_default();
    let mut errs = Vec::new();

    let project = schema::read_project(&root);
    let mut cat = Catalogue::embedded().map_err(|mut e| {
        e.insert(
            0,
            Diagnostic::file(
                "(built-in catalogue)",
                "catalogue",
                "the built-in catalogue does not read; this is a bug",
            ),
        );
        e
    })?;
    let mut hasher = Sha256::new();
    hasher.update(text.as_bytes());
    if let Some(p) = &project {
        for c in &p.catalogues {
            let file = dir.join(&c.value);
            match read_text(&file, &c.value, &c.key) {
                Ok(t) => {
                    hasher.update(t.as_bytes());
                    if let Err(mut e) = cat.merge_user_file(&file.display().to_string(), &t) {
                        errs.append(&mut e);
                    }
                }
                Err(_) => src.error(
                    c.span.clone(),
                    &c.key,
                    format!("cannot read catalogue file '{}'", file.display()),
                    Some("check the path; it is taken from the model's folder".into()),
                ),
            }
        }
    }
    for file in &options.catalogues {
        let name = file.display().to_string();
        match read_text(file, &name, "--catalogue") {
            Ok(t) => {
                hasher.update(t.as_bytes());
                if let Err(mut e) = cat.merge_user_file(&name, &t) {
                    errs.append(&mut e);
                }
            }
            Err(d) => errs.push(d),
        }
    }

    // Ids written in the file, read without error or not: a reference to an id whose own
    // table has an error is not reported again as dangling.
    let declared = |table: &str| -> BTreeSet<String> {
        doc.as_table()
            .get(table)
            .and_then(|t| t.as_table_like())
            .map(|t| t.iter().map(|(k, _)| k.to_string()).collect())
            .unwrap_or_default()
    };
    let nodes = schema::read_nodes(&root);
    let members = schema::read_members(&root, &cat, &nodes, &declared("nodes"));
    let details = schema::read_details(&root, &cat);
    let rules = if root.has("rules") {
        super::rules::read_rules(&root)
    } else {
        Vec::new()
    };
    let mut force_rows = forces::read_inline(&root);
    // Whether every force row was read: only then is a member without a force an error of its own.
    let mut forces_complete = project.is_some();
    if let Some(p) = &project {
        if let Some(f) = &p.forces_file {
            let file = dir.join(&f.value);
            match read_text(&file, &f.value, "forces") {
                Ok(t) => {
                    hasher.update(t.as_bytes());
                    match forces::read_csv(&file.display().to_string(), &t) {
                        Ok(mut rows) => force_rows.append(&mut rows),
                        Err(mut e) => {
                            forces_complete = false;
                            errs.append(&mut e);
                        }
                    }
                }
                Err(_) => {
                    forces_complete = false;
                    src.error(
                        f.span.clone(),
                        &f.key,
                        format!("cannot read forces file '{}'", file.display()),
                        Some("check the path; it is taken from the model's folder".into()),
                    )
                }
            }
        }
    }
    root.finish();

    let detail_ids: BTreeSet<&str> = details.iter().map(|d| d.id.as_str()).collect();
    check_member_ends(&src, &members, &detail_ids, &declared("details"));
    check_chord_mates(&src, &nodes, &members, &details, &declared("members"));
    check_forces(
        &src,
        &members,
        &declared("members"),
        &force_rows,
        forces_complete,
        &mut errs,
    );

    let mut all = src.take();
    all.append(&mut errs);
    if !all.is_empty() || project.is_none() {
        if all.is_empty() {
            all.push(Diagnostic::file(
                &shown,
                "project",
                "the project table could not be read",
            ));
        }
        return Err(all);
    }
    let hash = hasher
        .finalize()
        .iter()
        .map(|b| format!("{b:02x}"))
        .collect();
    Ok(Model {
        file: shown,
        project: project.expect("checked above").project,
        nodes,
        members,
        details,
        forces: force_rows,
        tolerances: cat.tolerances.values().cloned().collect(),
        rules,
        hash,
    })
}

fn toml_error(file: &str, text: &str, e: &toml_edit::TomlError) -> Diagnostic {
    let offset = e.span().map(|s| s.start).unwrap_or(0);
    let message = e.message().trim().replace('\n', "; ");
    let hint = if message.contains("duplicate key") {
        "each id and key may appear once; rename or remove the second one"
    } else {
        "check the TOML syntax at this point: strings in double quotes, `key = value`, tables in [brackets]"
    };
    Diagnostic::at(file, text, offset, "(syntax)", message).hint(hint)
}

fn check_member_ends(
    src: &Source,
    members: &[Member],
    detail_ids: &BTreeSet<&str>,
    declared: &BTreeSet<String>,
) {
    for m in members {
        for (key, d) in [("start", &m.start), ("end", &m.end)] {
            if let Some(d) = d {
                if !detail_ids.contains(d.as_str()) && !declared.contains(d) {
                    let near = nearest(d, detail_ids.iter().copied());
                    src.push(
                        Diagnostic::at(src.file, src.text, m.offset, format!("members.{}.{key}", m.id), format!("no detail '{d}' in [details]"))
                            .hint(match near.first() {
                                Some(n) => format!("did you mean '{n}'? (or \"none\" for an end without a checked connection)"),
                                None => "add a [details.ID] table, or write \"none\" for an end without a checked connection".into(),
                            }),
                    );
                }
            }
        }
    }
}

/// Every mate welded to a chord: the chord exists, and each member end using the detail can be
/// placed on it (error at the `chord` key for an unknown member, at the member end otherwise).
fn check_chord_mates(
    src: &Source,
    nodes: &[super::Node],
    members: &[Member],
    details: &[super::Detail],
    declared: &BTreeSet<String>,
) {
    let ids: Vec<&str> = members.iter().map(|m| m.id.as_str()).collect();
    for d in details {
        let super::DetailKind::Tab(t) = &d.kind else {
            continue;
        };
        let Some(oc) = &t.on_chord else { continue };
        let mut known = true;
        for c in &oc.chords {
            if ids.contains(&c.id.as_str()) {
                continue;
            }
            known = false;
            if !declared.contains(&c.id) {
                let near = nearest(&c.id, ids.iter().copied());
                src.push(
                    Diagnostic::at(
                        src.file,
                        src.text,
                        c.offset,
                        c.key.clone(),
                        format!("no member '{}' in [members] for the mate's chord", c.id),
                    )
                    .hint(match near.first() {
                        Some(n) => format!("did you mean '{n}'?"),
                        None => "give the id of the member the mate is welded to".into(),
                    }),
                );
            }
        }
        if !known {
            continue;
        }
        for m in members {
            for (end, key, used) in [
                (super::End::Start, "start", &m.start),
                (super::End::End, "end", &m.end),
            ] {
                if used.as_deref() != Some(d.id.as_str()) {
                    continue;
                }
                if let Err(e) = super::chord::placement(nodes, members, m, end, oc) {
                    src.push(
                        Diagnostic::at(
                            src.file,
                            src.text,
                            m.offset,
                            format!("members.{}.{key}", m.id),
                            format!(
                                "detail '{}' (mate on chord {}): {}",
                                d.id,
                                oc.names(),
                                e.message
                            ),
                        )
                        .hint(e.hint),
                    );
                }
            }
        }
    }
}

fn check_forces(
    src: &Source,
    members: &[Member],
    declared: &BTreeSet<String>,
    rows: &[ForceRow],
    rows_complete: bool,
    errs: &mut Vec<Diagnostic>,
) {
    let ids: BTreeSet<&str> = members.iter().map(|m| m.id.as_str()).collect();
    let mut seen: BTreeMap<(&str, &str), &str> = BTreeMap::new();
    for r in rows {
        let (file, line) = split_origin(&r.origin);
        if !ids.contains(r.member.as_str()) && !declared.contains(&r.member) {
            let near = nearest(&r.member, ids.iter().copied());
            let mut d = Diagnostic::file(
                file,
                "member",
                format!("no member '{}' in [members]", r.member),
            );
            d.line = line;
            d.column = 1;
            errs.push(d.hint(match near.first() {
                Some(n) => format!("did you mean '{n}'?"),
                None => "check the member id".into(),
            }));
        }
        if let Some(first) = seen.insert((r.member.as_str(), r.case.as_str()), r.origin.as_str()) {
            let mut d = Diagnostic::file(
                file,
                "case",
                format!(
                    "member '{}' has two forces for load case '{}' (first at {first})",
                    r.member, r.case
                ),
            );
            d.line = line;
            d.column = 1;
            errs.push(d.hint("keep one row per member and load case"));
        }
    }
    if !rows_complete {
        return;
    }
    let with_force: BTreeSet<&str> = rows.iter().map(|r| r.member.as_str()).collect();
    for m in members {
        if !with_force.contains(m.id.as_str()) {
            src.push(
                Diagnostic::at(
                    src.file,
                    src.text,
                    m.offset,
                    format!("members.{}", m.id),
                    format!("member '{}' has no force", m.id),
                )
                .hint("add a row `member,case,axial` to the forces file (a zero force counts)"),
            );
        }
    }
}

fn split_origin(origin: &str) -> (&str, usize) {
    match origin.rsplit_once(':') {
        Some((f, l)) => (f, l.parse().unwrap_or(0)),
        None => (origin, 0),
    }
}
