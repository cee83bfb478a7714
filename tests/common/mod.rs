//! The model text the CLI tests build on: a project of AISC 360-22, LRFD, US units, forces in
//! `forces.csv`, two nodes 4 ft apart and a member M1 between them whose start carries a detail.
//! Each test file adds its member keys and its detail tables.

#![allow(dead_code)] // each test file uses what it needs

/// The project, the nodes and member M1 (`section`, its start detail `start`), then the lines
/// `member_more` inside [members.M1] after `end = "none"`, then `rest` (the details).
pub fn one_member_model(
    title: &str,
    section: &str,
    start: &str,
    member_more: &str,
    rest: &str,
) -> String {
    format!(
        r#"[project]
title = "{title}"
revision = "A"
standard = "AISC 360-22"
method = "LRFD"
demand_factor = 1.0
units = "us"
hole_deformation = "considered"
forces = "forces.csv"

[nodes]
N1 = ["0 ft", "0 ft", "0 ft"]
N2 = ["4 ft", "0 ft", "0 ft"]

[members.M1]
from = "N1"
to = "N2"
section = "{section}"
material = "ASTM A500 Gr C (shaped)"
start = "{start}"
end = "none"
{member_more}{rest}"#
    )
}
