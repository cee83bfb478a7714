//! Located messages about bad input: `file:line:column: key: what is wrong (hint: likely fix)`.
//!
//! Every loader collects all the diagnostics of a run before stopping, so a user sees every mistake
//! at once.

use std::fmt;

/// One located message about bad input.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct Diagnostic {
    /// The file, as the user named it.
    pub file: String,
    /// 1-based line; 0 when the problem concerns the whole file.
    pub line: usize,
    /// 1-based column; 0 when unknown.
    pub column: usize,
    /// The key path, e.g. "details.T1.bolts.grade" or "forces.csv column 'axial'".
    pub key: String,
    /// What is wrong, in plain words.
    pub message: String,
    /// The likely fix, if one can be suggested.
    pub hint: Option<String>,
}

impl Diagnostic {
    /// A message at a byte offset of a source text.
    pub fn at(
        file: &str,
        source: &str,
        offset: usize,
        key: impl Into<String>,
        message: impl Into<String>,
    ) -> Self {
        let (line, column) = line_column(source, offset);
        Diagnostic {
            file: file.to_string(),
            line,
            column,
            key: key.into(),
            message: message.into(),
            hint: None,
        }
    }

    /// A message about a whole file.
    pub fn file(file: &str, key: impl Into<String>, message: impl Into<String>) -> Self {
        Diagnostic {
            file: file.to_string(),
            line: 0,
            column: 0,
            key: key.into(),
            message: message.into(),
            hint: None,
        }
    }

    /// Add the likely fix.
    pub fn hint(mut self, hint: impl Into<String>) -> Self {
        self.hint = Some(hint.into());
        self
    }
}

impl fmt::Display for Diagnostic {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        write!(f, "{}", self.file)?;
        if self.line > 0 {
            write!(f, ":{}", self.line)?;
            if self.column > 0 {
                write!(f, ":{}", self.column)?;
            }
        }
        write!(f, ": ")?;
        if !self.key.is_empty() {
            write!(f, "{}: ", self.key)?;
        }
        write!(f, "{}", self.message)?;
        if let Some(h) = &self.hint {
            write!(f, " (hint: {h})")?;
        }
        Ok(())
    }
}

/// 1-based line and column (in characters) of a byte offset.
pub fn line_column(source: &str, offset: usize) -> (usize, usize) {
    let offset = offset.min(source.len());
    let before = &source[..floor_char_boundary(source, offset)];
    let line = before.matches('\n').count() + 1;
    let col = before
        .rsplit('\n')
        .next()
        .map(|l| l.chars().count())
        .unwrap_or(0)
        + 1;
    (line, col)
}

fn floor_char_boundary(s: &str, mut i: usize) -> usize {
    while i > 0 && !s.is_char_boundary(i) {
        i -= 1;
    }
    i
}

/// The names among `candidates` closest to `name` (edit distance, case-insensitive), at most three,
/// for "did you mean" hints.
pub fn nearest<'a>(name: &str, candidates: impl IntoIterator<Item = &'a str>) -> Vec<String> {
    let target = name.to_ascii_lowercase();
    let mut scored: Vec<(usize, &str)> = candidates
        .into_iter()
        .map(|c| (edit_distance(&target, &c.to_ascii_lowercase()), c))
        .collect();
    scored.sort();
    let limit = (target.chars().count() / 2).max(3);
    scored
        .into_iter()
        .filter(|(d, _)| *d <= limit)
        .take(3)
        .map(|(_, c)| c.to_string())
        .collect()
}

fn edit_distance(a: &str, b: &str) -> usize {
    let a: Vec<char> = a.chars().collect();
    let b: Vec<char> = b.chars().collect();
    let mut prev: Vec<usize> = (0..=b.len()).collect();
    for (i, ca) in a.iter().enumerate() {
        let mut cur = vec![i + 1; b.len() + 1];
        for (j, cb) in b.iter().enumerate() {
            let cost = usize::from(ca != cb);
            cur[j + 1] = (prev[j] + cost).min(prev[j + 1] + 1).min(cur[j] + 1);
        }
        prev = cur;
    }
    prev[b.len()]
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn shape_of_a_message() {
        let src = "a = 1\nbolt = \"A235\"\n";
        let d = Diagnostic::at(
            "model.toml",
            src,
            13,
            "details.T1.bolt",
            "unknown bolt grade 'A235'",
        )
        .hint("nearest: A325, A490");
        assert_eq!(
            d.to_string(),
            "model.toml:2:8: details.T1.bolt: unknown bolt grade 'A235' (hint: nearest: A325, A490)"
        );
    }

    #[test]
    fn nearest_names() {
        let names = ["F3125 A325", "F3125 A490", "A307 A", "SAE J429 Gr 5"];
        assert_eq!(nearest("F3125 A235", names)[0], "F3125 A325");
        assert!(nearest("zzzzzzzzzzzzzzzzzzzzzzzz", names).is_empty());
    }
}
