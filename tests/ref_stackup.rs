//! Stack-ups worked by hand (no published source): inch units, thread lengths by the ASME B18.2.1
//! rule LT = 2D + 1/4 in. (L ≤ 6 in.) as given in the project's reference table; transition thread
//! Y = 5 pitches (from memory: the B18.2.1 hex cap screw table's Y). Compared to 1e-6 in.

use jointbook::stackup::{thread_layout, thread_length, threads_excluded, BoltType};
use jointbook::units::Length;

#[test]
fn threads_in_the_plane_for_one_length_excluded_for_the_next() {
    // Worked by hand. 1/2-13 hex bolt; shear plane 1-1/4 in. from the head (tab between plates).
    // L = 3 in.: LT = 1.25, Y = 5/13 = 0.3846, shank ends at 3 − 1.25 − 0.3846 = 1.3654 → excluded,
    // margin 0.1154 in. L = 2-3/4 in.: shank ends at 1.1154 < 1.25 → not excluded, margin −0.1346 in.
    let d = Length::inch(0.5);
    let y = Length::inch(5.0 / 13.0);
    let plane = Length::inch(1.25);
    let mut results = Vec::new();
    for l in [2.75, 3.0] {
        let l = Length::inch(l);
        let lt = thread_length(BoltType::HexBoltAsmeB18_2_1, d, l).unwrap();
        let layout = thread_layout(l, lt, y);
        results.push(threads_excluded(&layout, plane));
    }
    assert!(!results[0].0);
    assert!((results[0].1.to_in() + 0.134_615).abs() < 1e-6);
    assert!(results[1].0);
    assert!((results[1].1.to_in() - 0.115_385).abs() < 1e-6);
}

#[test]
fn fully_threaded_bolt_never_excludes_threads() {
    // Common practice: a fully threaded bolt has threads in every shear plane.
    let l = Length::inch(2.0);
    let layout = thread_layout(l, None, Length::inch(5.0 / 13.0));
    assert!(!threads_excluded(&layout, Length::inch(0.0)).0);
}
