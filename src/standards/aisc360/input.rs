//! Rejection of inputs a limit-state function cannot use (zero, negative or non-finite values),
//! shared by the clause files of AISC 360.

use std::fmt;

/// An input a limit-state function refuses, with the symbol it was given as and why.
#[derive(Debug, Clone, PartialEq)]
pub struct InputError {
    /// The standard's symbol of the refused input, e.g. "t" or "lc".
    pub symbol: &'static str,
    pub message: String,
}

impl InputError {
    pub fn new(symbol: &'static str, message: impl Into<String>) -> Self {
        InputError {
            symbol,
            message: message.into(),
        }
    }
}

impl fmt::Display for InputError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        write!(f, "{}: {}", self.symbol, self.message)
    }
}

impl std::error::Error for InputError {}

/// Refuses a value (in internal units) that is not a finite number above zero.
pub fn require_positive(symbol: &'static str, si: f64) -> Result<(), InputError> {
    if !si.is_finite() {
        return Err(InputError::new(symbol, "must be a finite number"));
    }
    if si <= 0.0 {
        return Err(InputError::new(symbol, "must be greater than zero"));
    }
    Ok(())
}

/// Refuses a value (in internal units) that is not a finite number at or above zero.
pub fn require_non_negative(symbol: &'static str, si: f64) -> Result<(), InputError> {
    if !si.is_finite() {
        return Err(InputError::new(symbol, "must be a finite number"));
    }
    if si < 0.0 {
        return Err(InputError::new(symbol, "must not be negative"));
    }
    Ok(())
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn refuses_zero_negative_and_non_finite() {
        assert_eq!(
            require_positive("t", 0.0).unwrap_err().to_string(),
            "t: must be greater than zero"
        );
        assert!(require_positive("t", -1.0).is_err());
        assert_eq!(
            require_positive("t", f64::NAN).unwrap_err().message,
            "must be a finite number"
        );
        assert!(require_positive("t", 1.0).is_ok());
        assert!(require_non_negative("frv", 0.0).is_ok());
        assert_eq!(
            require_non_negative("frv", -0.1).unwrap_err().message,
            "must not be negative"
        );
    }
}
