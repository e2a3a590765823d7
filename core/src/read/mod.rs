//! Read: a solved state and everything read from it, in the caller's units
//! (properties by name, partial derivatives, transport properties, the
//! distance from the saturation line, the printed form).

mod derivatives;
pub(crate) mod property;
mod saturation_margin;
pub(crate) mod state;
mod state_display;
pub(crate) mod transport;
pub(crate) mod variable;
