//! Member forces: a CSV file beside the model (`member,case,axial`, tension positive) and/or
//! `[[forces]]` tables in the model. The unit goes in each cell ("-4.2 kip") or once in the
//! header ("axial [kip]"), never nowhere.

use super::reader::Table;
use super::ForceRow;
use crate::diag::Diagnostic;
use crate::units::{parse_force, Force};

/// Read the rows of a forces CSV. `file` is the name used in messages.
pub fn read_csv(file: &str, text: &str) -> Result<Vec<ForceRow>, Vec<Diagnostic>> {
    let mut errs = Vec::new();
    let mut out = Vec::new();
    if text.trim().is_empty() {
        return Err(vec![Diagnostic::at(
            file,
            text,
            0,
            "header",
            "the forces file is empty",
        )
        .hint(
            "start it with the header `member,case,axial` and one row per member and load case",
        )]);
    }
    let mut rdr = csv::ReaderBuilder::new()
        .has_headers(true)
        .trim(csv::Trim::All)
        .comment(Some(b'#'))
        .from_reader(text.as_bytes());
    let headers = match rdr.headers() {
        Ok(h) => h.clone(),
        Err(e) => {
            return Err(vec![Diagnostic::at(
                file,
                text,
                0,
                "header",
                format!("unreadable header: {e}"),
            )
            .hint("the first line must be `member,case,axial`")]);
        }
    };
    let find = |name: &str| {
        headers
            .iter()
            .position(|h| h == name || h.starts_with(&format!("{name} [")))
    };
    let (Some(i_member), Some(i_case), Some(i_axial)) =
        (find("member"), find("case"), find("axial"))
    else {
        return Err(vec![Diagnostic::at(
            file,
            text,
            0,
            "header",
            format!(
                "the header '{}' lacks a column",
                headers.iter().collect::<Vec<_>>().join(",")
            ),
        )
        .hint(
            "the header must name the columns `member`, `case` and `axial` (or `axial [kip]`)",
        )]);
    };
    for (i, h) in headers.iter().enumerate() {
        if ![i_member, i_case, i_axial].contains(&i) {
            errs.push(
                Diagnostic::at(file, text, 0, "header", format!("unknown column '{h}'"))
                    .hint("the columns are member, case and axial"),
            );
        }
    }
    let header_unit = headers[i_axial]
        .strip_prefix("axial [")
        .and_then(|u| u.strip_suffix(']'))
        .map(str::trim)
        .map(str::to_string);
    if let Some(u) = &header_unit {
        if parse_force(&format!("1 {u}")).is_err() {
            errs.push(
                Diagnostic::at(
                    file,
                    text,
                    0,
                    "header",
                    format!("'{u}' is not a force unit"),
                )
                .hint("write `axial [kip]`, `axial [lbf]`, `axial [kN]` or `axial [N]`"),
            );
        }
    }
    // bare numbers in the axial column without a unit in the header: one error at the header
    // when every row is so (the unit was left out once), else one at each such cell
    let mut bare: Vec<Diagnostic> = Vec::new();
    let mut rows = 0usize;
    for rec in rdr.records() {
        let rec = match rec {
            Ok(r) => r,
            Err(e) => {
                let offset = e.position().map(|p| p.byte() as usize).unwrap_or(0);
                errs.push(
                    Diagnostic::at(file, text, offset, "row", format!("unreadable row: {e}"))
                        .hint("each row needs exactly three cells: member,case,axial"),
                );
                continue;
            }
        };
        rows += 1;
        let offset = rec.position().map(|p| p.byte() as usize).unwrap_or(0);
        let line = rec.position().map(|p| p.line()).unwrap_or(0);
        let cell_at = |i: usize| offset + rec.range(i).map(|r| r.start).unwrap_or(0);
        let member = rec.get(i_member).unwrap_or("").to_string();
        let case = rec.get(i_case).unwrap_or("").to_string();
        let axial_text = rec.get(i_axial).unwrap_or("");
        if member.is_empty() {
            errs.push(
                Diagnostic::at(file, text, cell_at(i_member), "member", "empty member id")
                    .hint("name a member of [members]"),
            );
            continue;
        }
        if case.is_empty() {
            errs.push(
                Diagnostic::at(file, text, cell_at(i_case), "case", "empty load case")
                    .hint("name the load case, e.g. `1.2D+1.6L`"),
            );
            continue;
        }
        let axial = match &header_unit {
            Some(u) => match axial_text.parse::<f64>() {
                Ok(v) if v.is_finite() => parse_force(&format!("{v} {u}")).ok(),
                _ => {
                    errs.push(
                        Diagnostic::at(
                            file,
                            text,
                            cell_at(i_axial),
                            "axial",
                            format!("'{axial_text}' is not a number"),
                        )
                        .hint(format!(
                            "the header gives the unit ({u}); write a plain number like -4.25"
                        )),
                    );
                    None
                }
            },
            None => match parse_force(axial_text) {
                Ok(f) => Some(f),
                Err(e) => {
                    let is_bare = axial_text.parse::<f64>().is_ok();
                    let hint = if is_bare {
                        "a bare number has no unit: write \"-4.25 kip\", or give the unit once in the header as `axial [kip]`".to_string()
                    } else {
                        "write the force with its unit, e.g. -4.25 kip or 18.9 kN".to_string()
                    };
                    let d = Diagnostic::at(file, text, cell_at(i_axial), "axial", e.to_string())
                        .hint(hint);
                    if is_bare {
                        bare.push(d);
                    } else {
                        errs.push(d);
                    }
                    None
                }
            },
        };
        if let Some(axial) = axial {
            out.push(ForceRow {
                member,
                case,
                axial,
                origin: format!("{file}:{line}"),
            });
        }
    }
    if rows > 1 && bare.len() == rows {
        // the header is the first line that is neither blank nor a comment
        let mut at = 0;
        for l in text.split_inclusive('\n') {
            let t = l.trim();
            if !t.is_empty() && !t.starts_with('#') {
                break;
            }
            at += l.len();
        }
        errs.push(
            Diagnostic::at(
                file,
                text,
                at,
                "header",
                format!(
                    "every axial force is a bare number ({} rows) and the header gives no unit",
                    rows
                ),
            )
            .hint("give the unit once in the header: `member,case,axial [kip]` (or [kN])"),
        );
    } else {
        errs.append(&mut bare);
    }
    if out.is_empty() && errs.is_empty() {
        errs.push(
            Diagnostic::at(
                file,
                text,
                0,
                "row",
                "the forces file has a header but no rows",
            )
            .hint("add one row per member and load case"),
        );
    }
    if errs.is_empty() {
        Ok(out)
    } else {
        Err(errs)
    }
}

/// Read `[[forces]]` tables of the model: `member`, `case`, `axial` with its unit.
pub fn read_inline(root: &Table) -> Vec<ForceRow> {
    let Some(rows) = root.opt_array_of_tables("forces") else {
        return Vec::new();
    };
    let mut out = Vec::new();
    for t in rows {
        let member = t.req_str("member", "\"M1\"");
        let case = t.req_str("case", "\"1.2D+1.6L\"");
        let axial: Option<Force> = t.req_force("axial");
        t.finish();
        if let (Some(member), Some(case), Some(axial)) = (member, case, axial) {
            let (line, _) =
                crate::diag::line_column(t.src.text, t.span.as_ref().map(|s| s.start).unwrap_or(0));
            out.push(ForceRow {
                member: member.value,
                case: case.value,
                axial,
                origin: format!("{}:{}", t.src.file, line),
            });
        }
    }
    out
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn units_in_cells_or_header() {
        let rows = read_csv("f.csv", "member,case,axial\nM1,D,-4.5 kip\nM2,D,20 kN\n").unwrap();
        assert_eq!(rows.len(), 2);
        assert!((rows[0].axial.to_kip() + 4.5).abs() < 1e-12);
        assert_eq!(rows[1].origin, "f.csv:3");
        let rows = read_csv("f.csv", "member,case,axial [kip]\nM1,D,-4.5\n").unwrap();
        assert!((rows[0].axial.to_kip() + 4.5).abs() < 1e-12);
    }

    #[test]
    fn a_header_without_unit_over_bare_numbers_is_one_error_at_the_header() {
        let text = "# forces\nmember,case,axial\nM1,A,2.5\nM1,B,-1.0\nM2,A,3\n";
        let e = read_csv("f.csv", text).unwrap_err();
        assert_eq!(e.len(), 1, "{e:?}");
        assert_eq!((e[0].line, e[0].key.as_str()), (2, "header"));
    }

    #[test]
    fn bare_number_without_header_unit_is_refused_at_its_line() {
        let errs = read_csv("f.csv", "member,case,axial\nM1,D,-4.5 kip\nM2,D,12\n").unwrap_err();
        assert_eq!(errs.len(), 1);
        assert_eq!(errs[0].line, 3);
        assert_eq!(errs[0].key, "axial");
    }

    #[test]
    fn missing_column_and_short_row() {
        assert!(read_csv("f.csv", "member,axial\nM1,-4 kip\n").is_err());
        let errs = read_csv("f.csv", "member,case,axial\nM1,D\n").unwrap_err();
        assert_eq!(errs[0].line, 2);
        assert!(read_csv("f.csv", "").is_err());
    }
}
