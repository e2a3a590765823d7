//! One request to the engine: the input pair, the units of its values and
//! of the state, and how an inverse pair is finished.

use crate::{batch, Error, InputPair, Method, Property, State, Units};

use super::{Reading, Status};

/// What a binding asks for, apart from the two values: the same three
/// choices whether they came as C numbers or Python names.
#[derive(Clone, Copy, Debug, PartialEq, Eq, Hash)]
pub struct Request {
    /// The two properties the values give, in this order.
    pub pair: InputPair,
    /// The units of the values and of the state.
    pub units: Units,
    /// How a pair with IAPWS backward equations is finished.
    pub method: Method,
}

/// Every method, by number (the C ABI's `EbullioMethod`).
const METHODS: [Method; 2] = [Method::Exact, Method::BackwardOnly];

impl Request {
    /// The request from the numbers a C caller passes, or the status of
    /// the first one that names nothing.
    pub fn from_numbers(pair: u32, units: u32, method: u32) -> Result<Request, Status> {
        Ok(Request {
            pair: InputPair::from_number(pair).ok_or(Status::UnknownInputPair)?,
            units: Request::units_from_number(units)?,
            method: METHODS
                .into_iter()
                .find(|m| *m as u32 == method)
                .ok_or(Status::UnknownMethod)?,
        })
    }

    /// The unit system with this number, or `Status::UnknownUnits`.
    pub fn units_from_number(n: u32) -> Result<Units, Status> {
        Units::ALL
            .into_iter()
            .find(|u| *u as u32 == n)
            .ok_or(Status::UnknownUnits)
    }

    /// The state at values `a` and `b`: [`State::solve`].
    pub fn solve(self, a: f64, b: f64) -> Result<State, Error> {
        State::solve(self.pair, a, b, self.units, self.method)
    }

    /// One reading of the state at `a` and `b`, as [`State::reading`] gives it
    /// on [`Request::solve`]'s state. The exact enthalpy from (p, T) takes
    /// the core's cheap path, which gives the same bits as the exact
    /// state; the backward method solves the state, whose region 3
    /// density, and so enthalpy, is the backward equation's.
    pub fn read(self, reading: Reading, a: f64, b: f64) -> Result<Option<f64>, Error> {
        if reading == Reading::Thermodynamic(Property::Enthalpy)
            && self.pair == InputPair::PressureTemperature
            && self.method == Method::Exact
        {
            return crate::enthalpy_from_pt(a, b, self.units).map(Some);
        }
        self.solve(a, b)?.reading(reading)
    }

    /// [`Request::solve`] of every (a, b) of `inputs`: `each` gets the
    /// element's index and its state, once per element, in no particular
    /// order. Exact (p, T) goes through the batch kernels
    /// ([`batch::states_from_pt`]), the same bits several per instruction;
    /// every other request element by element.
    pub fn solve_each(
        self,
        inputs: impl IntoIterator<Item = (f64, f64)>,
        mut each: impl FnMut(usize, Result<State, Error>),
    ) {
        if self.pair == InputPair::PressureTemperature && self.method == Method::Exact {
            batch::states_from_pt(inputs, self.units, each);
        } else {
            for (i, (a, b)) in inputs.into_iter().enumerate() {
                each(i, self.solve(a, b));
            }
        }
    }

    /// [`Request::read`] of every (a, b) of `inputs`, as
    /// [`Request::solve_each`] gives states: the exact enthalpy from
    /// (p, T) through [`batch::enthalpies_from_pt`].
    pub fn read_each(
        self,
        reading: Reading,
        inputs: impl IntoIterator<Item = (f64, f64)>,
        mut each: impl FnMut(usize, Result<Option<f64>, Error>),
    ) {
        if reading == Reading::Thermodynamic(Property::Enthalpy)
            && self.pair == InputPair::PressureTemperature
            && self.method == Method::Exact
        {
            batch::enthalpies_from_pt(inputs, self.units, |i, h| each(i, h.map(Some)));
        } else {
            self.solve_each(inputs, |i, state| {
                each(i, state.and_then(|s| s.reading(reading)));
            });
        }
    }
}
