//! Thread lengths of heavy hex structural bolts, ASME B18.2.6 (edition not at hand): LT in inches
//! by diameter as printed in the project's reference table (1/2 → 1.00, 5/8 → 1.25, 3/4 → 1.38,
//! 7/8 → 1.50, 1 → 1.75). Printed to two decimals; compared to 1e-9 in. since the table is data.

use jointbook::stackup::{thread_length, BoltType};
use jointbook::units::Length;

#[test]
fn b18_2_6_thread_lengths() {
    for (d, lt) in [
        (0.5, 1.00),
        (0.625, 1.25),
        (0.75, 1.38),
        (0.875, 1.50),
        (1.0, 1.75),
    ] {
        let got = thread_length(
            BoltType::HeavyHexStructuralAsmeB18_2_6,
            Length::inch(d),
            Length::inch(4.0),
        )
        .unwrap()
        .unwrap();
        assert!((got.to_in() - lt).abs() < 1e-9, "{d}: {}", got.to_in());
    }
}
