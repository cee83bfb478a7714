//! The template environment of the sheet: the embedded templates, replaced one by one by those of
//! the same name in a user's folder. HTML and SVG templates escape every value unless a template
//! marks it safe; the Markdown template escapes model text with the `md` filter.

use crate::diag::Diagnostic;
use minijinja::{AutoEscape, Environment, ErrorKind, UndefinedBehavior};
use serde::Serialize;
use std::path::PathBuf;

/// The templates built into the program, by name.
pub const EMBEDDED: [(&str, &str); 3] = [
    ("sheet.html", include_str!("../../templates/sheet.html")),
    ("sheet.md", include_str!("../../templates/sheet.md")),
    ("sheet.css", include_str!("../../templates/sheet.css")),
];

/// Escape text for Markdown: characters that would start markup are backslashed, and `<`, `>`
/// and `&` become entities so no raw HTML passes through a renderer.
pub fn markdown_escape(s: &str) -> String {
    let mut out = String::with_capacity(s.len());
    for c in s.chars() {
        match c {
            '&' => out.push_str("&amp;"),
            '<' => out.push_str("&lt;"),
            '>' => out.push_str("&gt;"),
            '\\' | '`' | '*' | '_' | '[' | ']' | '|' | '#' => {
                out.push('\\');
                out.push(c);
            }
            '\n' => out.push(' '),
            c => out.push(c),
        }
    }
    out
}

/// A user's template folder must exist and hold at least one of the built-in templates' names
/// (else the user's templates would be silently ignored).
pub fn check_folder(dir: &std::path::Path) -> Result<(), Vec<crate::diag::Diagnostic>> {
    let shown = dir.display().to_string();
    let names: Vec<&str> = EMBEDDED.iter().map(|(n, _)| *n).collect();
    if !dir.is_dir() {
        return Err(vec![crate::diag::Diagnostic::file(
            &shown,
            "--templates",
            "the template folder does not exist; nothing was written",
        )
        .hint("name a folder holding sheet.html, sheet.md or sheet.css, or leave --templates out for the built-in ones")]);
    }
    if !names.iter().any(|n| dir.join(n).is_file()) {
        return Err(vec![crate::diag::Diagnostic::file(
            &shown,
            "--templates",
            format!(
                "the folder holds none of the templates ({}); nothing was written",
                names.join(", ")
            ),
        )
        .hint("name the files exactly sheet.html, sheet.md or sheet.css")]);
    }
    Ok(())
}

/// The environment: embedded templates, or the user's file of the same name in `folder`.
pub fn environment(folder: Option<PathBuf>) -> Environment<'static> {
    let mut env = Environment::new();
    env.set_undefined_behavior(UndefinedBehavior::Strict);
    env.set_keep_trailing_newline(true);
    env.set_trim_blocks(true);
    env.set_lstrip_blocks(true);
    env.set_auto_escape_callback(|name| {
        if name.ends_with(".html") || name.ends_with(".svg") {
            AutoEscape::Html
        } else {
            AutoEscape::None
        }
    });
    env.add_filter("md", |s: String| markdown_escape(&s));
    env.set_loader(move |name| {
        if name.contains("..") || name.contains('/') || name.contains('\\') {
            return Ok(None);
        }
        if let Some(dir) = &folder {
            let path = dir.join(name);
            if path.is_file() {
                return std::fs::read_to_string(&path).map(Some).map_err(|e| {
                    minijinja::Error::new(
                        ErrorKind::InvalidOperation,
                        format!("cannot read template '{}': {e}", path.display()),
                    )
                });
            }
        }
        Ok(EMBEDDED
            .iter()
            .find(|(n, _)| *n == name)
            .map(|(_, t)| t.to_string()))
    });
    env
}

/// Render one template with the context; a template that is missing or does not render is an
/// input error naming the template and the line.
pub fn render<C: Serialize>(
    env: &Environment<'static>,
    folder: Option<&std::path::Path>,
    name: &str,
    ctx: &C,
) -> Result<String, Vec<Diagnostic>> {
    let to_diag = |e: minijinja::Error| {
        let file = e.name().unwrap_or(name).to_string();
        // the user's own template is named with its folder; a built-in one by its name alone
        let shown = match folder.map(|f| f.join(&file)).filter(|p| p.is_file()) {
            Some(p) => p.display().to_string(),
            None => format!("{file} (built in)"),
        };
        let what = match e.detail() {
            Some(d) => format!("{}: {d}", e.kind()),
            None => e.kind().to_string(),
        };
        let mut d = Diagnostic::file(
            &shown,
            "template",
            format!("the template does not render: {what}"),
        )
        .hint("check the template against the context keys listed in DEVELOPERS.md");
        d.line = e.line().unwrap_or(0);
        d.column = usize::from(e.line().is_some());
        vec![d]
    };
    env.get_template(name)
        .map_err(to_diag)?
        .render(ctx)
        .map_err(to_diag)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn markdown_escape_neutralises_markup() {
        assert_eq!(
            markdown_escape("<script>a|b*c_d</script>"),
            "&lt;script&gt;a\\|b\\*c\\_d&lt;/script&gt;"
        );
    }

    #[test]
    fn html_templates_escape_and_markdown_does_not() {
        let mut env = environment(None);
        env.add_template("t.html", "{{ x }}").unwrap();
        env.add_template("t.md", "{{ x }}|{{ x|md }}").unwrap();
        let ctx = serde_json::json!({ "x": "<b>" });
        assert_eq!(render(&env, None, "t.html", &ctx).unwrap(), "&lt;b&gt;");
        assert_eq!(render(&env, None, "t.md", &ctx).unwrap(), "<b>|&lt;b&gt;");
    }

    #[test]
    fn an_unknown_key_is_an_error_naming_the_template() {
        let mut env = environment(None);
        env.add_template("bad.html", "line one\n{{ nothing.here }}")
            .unwrap();
        let e = render(&env, None, "bad.html", &serde_json::json!({})).unwrap_err();
        assert_eq!(e[0].file, "bad.html (built in)");
        assert_eq!(e[0].line, 2);
        assert!(e[0].message.contains("undefined"), "{}", e[0].message);
    }
}
