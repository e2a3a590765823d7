//! One request to the engine: the input pair, the units of its values and
//! of the state, and how an inverse pair is finished.

use crate::{Error, InputPair, Method, State, Units};

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
        if reading == Reading::Thermodynamic(crate::Property::Enthalpy)
            && self.pair == InputPair::PressureTemperature
            && self.method == Method::Exact
        {
            return crate::enthalpy_from_pt(a, b, self.units).map(Some);
        }
        self.solve(a, b)?.reading(reading)
    }
}
