"""pandas DataFrames of results, phase and status by name.

A phase or status column is a pandas Categorical whose categories are every
name of its enum, in code order: it reads as words ("superheated vapour",
"out of range"), selects by name (``frame["status"] != "ok"``), costs a
byte per row, and frames of different batches concatenate as categories.
A bad element's phase (code 0) is missing. pandas is imported only here,
when a frame is asked for (``pip install "ebullio[pandas]"``).
"""

from __future__ import annotations

import enum
from typing import Any, Dict

import numpy as np


def pandas() -> Any:
    """The pandas module, or an ImportError that says how to get it."""
    try:
        import pandas
    except ImportError:
        raise ImportError('DataFrames need pandas: pip install "ebullio[pandas]" (or pandas itself)') from None
    return pandas


def named(codes: Any, kind: type[enum.IntEnum]) -> Any:
    """The codes of ``kind`` (``Phase``, ``Status``) as a Categorical of
    their names; a code ``kind`` has no member for is missing."""
    members = list(kind)
    top = max(member.value for member in members)
    position = np.full(top + 2, -1, dtype=np.int16)  # the last slot: any code past top
    for k, member in enumerate(members):
        position[member.value] = k
    flat = np.minimum(np.asarray(codes).reshape(-1), top + 1)
    return pandas().Categorical.from_codes(position[flat], categories=[str(m) for m in members])


def frame(columns: Dict[str, Any], index: Any = None) -> Any:
    """A DataFrame of ``columns`` (1-D arrays or Categoricals of one length)."""
    return pandas().DataFrame(columns, index=index)


def one_dimensional(array: np.ndarray, what: str) -> np.ndarray:
    """``array`` flattened for a frame's column: 0-d gives one row; more
    dimensions than one are refused (rows would need an order)."""
    if array.ndim > 1:
        raise ValueError(f"to_frame needs a 1-D {what} (this one has shape {array.shape}): index it or reshape its inputs first")
    return array.reshape(-1)
