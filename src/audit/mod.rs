//! Rule audit: piece box, piece weight, structure envelope, clear zones, connection rules.
