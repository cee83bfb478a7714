//! Catalogues: bolt and nut grades, threads, nuts and washers, bolt lengths, tube sections,
//! materials and electrodes. Embedded from catalogues/*.toml; a user may add or override entries.
