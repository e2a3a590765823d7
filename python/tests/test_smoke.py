"""The installed wheel: imports from site-packages, abi3, version from Cargo."""

import importlib.metadata
import pathlib
import re

import ebullio

ROOT = pathlib.Path(__file__).resolve().parents[2]


def test_imports_the_installed_wheel():
    native = pathlib.Path(ebullio._native.__file__)
    assert "site-packages" in native.parts, native
    assert native.name.endswith(".abi3.so") or native.suffix == ".pyd"
    assert (native.parent / "py.typed").exists() and (native.parent / "__init__.pyi").exists()


def test_version_comes_from_cargo():
    workspace = (ROOT / "Cargo.toml").read_text()
    version = re.search(r'\[workspace\.package\][^\[]*?version\s*=\s*"([^"]+)"', workspace, re.S).group(1)
    assert ebullio.__version__ == version == importlib.metadata.version("ebullio")


def test_a_first_state():
    # recalled from IAPWS R7-97(2012), Table 5: h(3 MPa, 300 K) = 0.115331273e3 kJ/kg
    assert abs(ebullio.State.from_pt(3.0, 300.0, units="native").h - 115.331273) < 5e-7


def test_install_extras_bring_pandas_and_matplotlib():
    # The README's install line asks for ebullio[pandas,charts]; the wheel
    # must declare what each extra brings.
    meta = importlib.metadata.metadata("ebullio")
    assert {"pandas", "charts"} <= set(meta.get_all("Provides-Extra"))
    requires = [r.replace(" ", "").replace("'", '"') for r in meta.get_all("Requires-Dist")]
    assert any(r.startswith("pandas") and 'extra=="pandas"' in r for r in requires), requires
    assert any(r.startswith("matplotlib") and 'extra=="charts"' in r for r in requires), requires
