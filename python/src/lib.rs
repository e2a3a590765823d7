//! `ebullio._native`: the extension module behind the `ebullio` Python
//! package.
//!
//! A thin layer over the core's vocabulary (`Request`, `Reading`,
//! `Status`). A scalar call is one `Request::solve` and nothing more; an
//! array call is whole in Rust ([`array_call`]: array-likes to float64,
//! broadcasting, `out=`) and runs the same core call once per element,
//! split over the cores with the GIL released ([`arrays`]), so every
//! element carries exactly the bits the Rust core gives for it. The
//! arithmetic lives only in the core: nothing here computes a property.
//!
//! The Python side (`python/ebullio/`) keeps the array result classes
//! (`_arrays.py`), which call back only into this module, and the enums
//! (`_enums.py`).

use pyo3::prelude::*;

mod array_call;
mod arrays;
mod columns;
mod errors;
mod inputs;
mod measured;
mod names;
mod off_design;
mod plant;
mod plant_losses;
mod saturation;
mod state;

#[pymodule]
fn _native(m: &Bound<'_, PyModule>) -> PyResult<()> {
    m.add("__version__", env!("CARGO_PKG_VERSION"))?;
    m.add_class::<state::PyState>()?;
    m.add_class::<saturation::PySaturation>()?;
    errors::register(m)?;
    plant::register(m)?;
    m.add_function(wrap_pyfunction!(state::solve_scalar, m)?)?;
    m.add_function(wrap_pyfunction!(saturation::saturation_scalar, m)?)?;
    m.add_function(wrap_pyfunction!(arrays::solve_many, m)?)?;
    m.add_function(wrap_pyfunction!(arrays::transport_many, m)?)?;
    m.add_function(wrap_pyfunction!(arrays::derivative_many, m)?)?;
    m.add_function(wrap_pyfunction!(arrays::near_saturation_many, m)?)?;
    m.add_function(wrap_pyfunction!(arrays::surface_tension_many, m)?)?;
    m.add_function(wrap_pyfunction!(arrays::raise_element, m)?)?;
    m.add_function(wrap_pyfunction!(array_call::solve_states, m)?)?;
    m.add_function(wrap_pyfunction!(inputs::kept, m)?)?;
    m.add_function(wrap_pyfunction!(names::units_required, m)?)?;
    m.add_function(wrap_pyfunction!(measured::measured_scalar, m)?)?;
    m.add_function(wrap_pyfunction!(measured::measured_many, m)?)?;
    m.add("PROPERTIES", columns::table(m.py())?)?;
    m.add("TRANSPORT", columns::transport_table(m.py())?)?;
    m.add("STATUS_CODES", errors::status_table(m.py())?)?;
    m.add("MEASURED", measured::table(m.py())?)?;
    m.add("MEASURED_FLAGS", measured::flags_table(m.py())?)?;
    Ok(())
}
