//! Why a plant call refused its arguments before (or while) the core
//! solved: a code, count or size of the C blocks (a status alone), or the
//! core's own refusal, whose reason goes into the error detail.

use ebullio::{Error, Units};

use crate::args::OutStruct;
use crate::detail::{report, EbullioErrorDetail};
use crate::status::EbullioStatus;

#[derive(Debug, PartialEq)]
pub(crate) enum Refused {
    /// A code, count, size or pointer of the C blocks.
    Code(EbullioStatus),
    /// The core refused a part (a curve, a casing) or the whole.
    Core(Error),
}

impl From<EbullioStatus> for Refused {
    fn from(status: EbullioStatus) -> Refused {
        Refused::Code(status)
    }
}

impl From<Error> for Refused {
    fn from(e: Error) -> Refused {
        Refused::Core(e)
    }
}

impl Refused {
    /// Fills `detail` (if the caller gave one) for numbers in `units`,
    /// and gives the status.
    pub(crate) fn report(
        &self,
        detail: &Option<OutStruct<EbullioErrorDetail>>,
        units: Units,
    ) -> EbullioStatus {
        match self {
            Refused::Code(status) => {
                report(detail, || EbullioErrorDetail::of_status(*status, units));
                *status
            }
            Refused::Core(e) => {
                report(detail, || EbullioErrorDetail::of_error(e, units));
                EbullioStatus::from(e)
            }
        }
    }
}
