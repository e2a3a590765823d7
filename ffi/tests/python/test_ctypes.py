"""The shared library loaded the way a spreadsheet macro's foreign-function
declaration loads a DLL: by path, each function declared with its argument
and return types by hand, scalars by value and the status by reference.
Standard library only. Usage: python3 test_ctypes.py path/to/libebullio_c.so
"""
import ctypes
import math
import sys

lib = ctypes.CDLL(sys.argv[1])

# double ebullio_property(uint32 property, uint32 pair, double a, double b,
#                         uint32 units, uint32 method, int32 *status)
prop = lib.ebullio_property
prop.argtypes = [ctypes.c_uint32, ctypes.c_uint32, ctypes.c_double, ctypes.c_double,
                 ctypes.c_uint32, ctypes.c_uint32, ctypes.POINTER(ctypes.c_int32)]
prop.restype = ctypes.c_double

# double ebullio_derivative(uint32 z, uint32 x, uint32 y, uint32 pair, double a,
#                           double b, uint32 units, uint32 method, int32 *status)
deriv = lib.ebullio_derivative
deriv.argtypes = [ctypes.c_uint32] * 4 + [ctypes.c_double] * 2 + [ctypes.c_uint32] * 2 + [
    ctypes.POINTER(ctypes.c_int32)]
deriv.restype = ctypes.c_double

message = lib.ebullio_status_message
message.argtypes = [ctypes.c_int32]
message.restype = ctypes.c_char_p

lib.ebullio_abi_version.restype = ctypes.c_uint32
lib.ebullio_version.restype = ctypes.c_char_p

# Numbers as a macro module would declare them as constants.
PT, PH, RHO_T, PX, TX = 1, 2, 5, 8, 9
NATIVE, SI, METRIC, US = 0, 1, 2, 3
T_, H, S, CP, W = 2, 6, 7, 8, 10
VISCOSITY, CONDUCTIVITY, SURFACE_TENSION, JOULE_THOMSON = 16, 17, 21, 23
V_P, V_T, V_RHO, V_H, V_S = 1, 2, 4, 6, 7

checks = failures = 0


def check(ok, what):
    global checks, failures
    checks += 1
    if not ok:
        failures += 1
        print("check failed:", what)


def printed(actual, text, what):
    """Agreement to half a unit in the last printed place."""
    mantissa, _, exponent = text.partition("e")
    decimals = len(mantissa.partition(".")[2])
    half = 0.5 * 10.0 ** (int(exponent or 0) - decimals)
    check(abs(actual - float(text)) <= half * (1 + 1e-9), f"{what}: {actual!r} vs {text}")


def cell(property, pair, a, b, units=NATIVE):
    status = ctypes.c_int32(-1)
    value = prop(property, pair, a, b, units, 0, ctypes.byref(status))
    return value, status.value


check(lib.ebullio_abi_version() == 1, "ABI version")
check(lib.ebullio_version().decode() == sys.argv[2], "version string")

# recalled from IAPWS R7-97(2012), Table 5 (3 MPa, 300 K) and Table 15 (0.0035 MPa, 300 K)
for (p, t, prop_no, text) in [(3.0, 300.0, H, "0.115331273e3"),
                              (3.0, 300.0, S, "0.392294792"),
                              (3.0, 300.0, W, "0.150773921e4"),
                              (0.0035, 300.0, H, "0.254991145e4"),
                              (0.0035, 300.0, CP, "0.191300162e1")]:
    value, status = cell(prop_no, PT, p, t)
    check(status == 0, f"status {status}")
    printed(value, text, f"property {prop_no} at ({p}, {t})")

# The same Table 5 state in US customary units: 3 MPa = 435.1131 psia,
# 300 K = 80.33 degF; h = 115.331273 kJ/kg / 2.326 (NIST SP 811, B.8: Btu_IT/lb).
psia = 3e6 / (0.45359237 * 9.80665 / 0.3048 ** 2 * 144)
h_us, status = cell(H, PT, psia, 300.0 * 1.8 - 459.67, US)
check(status == 0, "US status")
check(abs(h_us - 115.331273 / 2.326) < 1e-6, f"US h {h_us}")

# recalled from IAPWS R7-97(2012), Table 36: Tsat(0.1 MPa)
tsat, status = cell(T_, PX, 0.1, 1.0)
printed(tsat, "0.372755919e3", "Tsat(0.1 MPa)")

# Transport cells. recalled from IAPWS R12-08, Table 4: 14.538324 uPa s at
# 433.15 K and 1 kg/m3; recalled from IAPWS R15-11, Table 5: 607.712868
# mW/(m K) at 298.15 K and 998 kg/m3 (no critical enhancement in cold liquid,
# R15-11 Eq. (21)); recalled from IAPWS R1-76(2014): 58.91 mN/m at 100 degC.
value, status = cell(VISCOSITY, RHO_T, 1.0, 433.15)
check(status == 0, "viscosity status")
printed(value * 1e6, "14.538324", "R12-08 Table 4 mu(433.15 K, 1 kg/m3)")
value, status = cell(CONDUCTIVITY, RHO_T, 998.0, 298.15)
printed(value * 1e3, "607.712868", "R15-11 Table 5 lambda(298.15 K, 998 kg/m3)")
value, status = cell(SURFACE_TENSION, TX, 100.0, 0.0, METRIC)
printed(value * 1e3, "58.91", "R1-76 sigma(100 degC)")
value, status = cell(VISCOSITY, PT, 30.0, 1500.0)
check(math.isnan(value) and status == 201, "viscosity above 1173.15 K")


def derivative(z, x, y, pair, a, b, units=NATIVE):
    status = ctypes.c_int32(-1)
    value = deriv(z, x, y, pair, a, b, units, 0, ctypes.byref(status))
    return value, status.value


# recalled from IAPWS R7-97(2012), Table 15 (0.0035 MPa, 700 K): cp = (dh/dT)_p,
# and w = 0.644289068e3 m/s from (dp/drho)_s (MPa, so 1e6).
value, status = derivative(V_H, V_T, V_P, PT, 0.0035, 700.0)
check(status == 0, "derivative status")
printed(value, "0.208141274e1", "(dh/dT)_p = cp")
value, status = derivative(V_P, V_RHO, V_S, PT, 0.0035, 700.0)
printed(math.sqrt(value * 1e6), "0.644289068e3", "w from (dp/drho)_s")
# The Joule-Thomson cell is the derivative (dT/dp)_h, bit for bit.
jt, status = cell(JOULE_THOMSON, PT, 0.0035, 700.0)
value, _ = derivative(V_T, V_P, V_H, PT, 0.0035, 700.0)
check(status == 0 and jt == value, "Joule-Thomson cell is (dT/dp)_h")
value, status = derivative(V_H, V_P, V_T, PX, 1.0, 0.5)
check(math.isnan(value) and status == 205, "(dh/dp)_T of wet steam")
value, status = derivative(V_H, V_P, 42, PT, 3.0, 300.0)
check(math.isnan(value) and status == 107, "unknown variable")
check(b"variable" in message(107), "message for 107")

# Errors come back as NaN and a status, as a worksheet cell shows them.
value, status = cell(H, PT, 200.0, 300.0)
check(math.isnan(value) and status == 201, "out of range")
check(b"outside" in message(status), "message for 201")
value, status = cell(H, PT, float("nan"), 300.0)
check(math.isnan(value) and status == 200, "NaN input")
value, status = cell(CP, PX, 0.1, 0.5)
check(math.isnan(value) and status == 205, "cp of wet steam")
value, status = cell(99, PT, 3.0, 300.0)
check(status == 104, "unknown property")
value, status = cell(H, 0, 3.0, 300.0)
check(status == 101, "unknown pair")
value, status = cell(H, PT, 3.0, 300.0, 17)
check(status == 102, "unknown units")
# A null status pointer is allowed: the value alone.
check(abs(prop(H, PT, 3.0, 300.0, 0, 0, None) - 115.331273) < 5e-7, "null status")
check(message(12345) == b"unknown status code", "unknown code")

# The measured-data calls as a worksheet declares them: structs by hand,
# a turbine section in bar and degC (an invented operating point).
class MeasuredInput(ctypes.Structure):
    _fields_ = [("value", ctypes.c_double), ("systematic", ctypes.c_double),
                ("random", ctypes.c_double), ("shared", ctypes.c_uint32),
                ("reserved", ctypes.c_uint32)]


class MeasuredFigure(ctypes.Structure):
    _fields_ = [(name, ctypes.c_double) for name in
                ("value", "standard_uncertainty", "expanded_uncertainty",
                 "systematic_uncertainty", "random_uncertainty")]


class MeasuredColumn(ctypes.Structure):
    _fields_ = [("values", ctypes.POINTER(ctypes.c_double)), ("n_values", ctypes.c_size_t),
                ("systematic", ctypes.POINTER(ctypes.c_double)),
                ("n_systematic", ctypes.c_size_t),
                ("random", ctypes.POINTER(ctypes.c_double)), ("n_random", ctypes.c_size_t),
                ("shared", ctypes.c_uint32), ("reserved", ctypes.c_uint32)]


SECTION_TEST, NEAR_SATURATION_FLAG = 1, 1
measured = lib.ebullio_measured
measured.argtypes = [ctypes.c_uint32, ctypes.POINTER(ctypes.c_double), ctypes.c_size_t,
                     ctypes.POINTER(MeasuredInput), ctypes.c_size_t, ctypes.c_uint32,
                     ctypes.c_double, ctypes.POINTER(MeasuredFigure), ctypes.c_size_t,
                     ctypes.POINTER(ctypes.c_double), ctypes.POINTER(ctypes.c_double),
                     ctypes.POINTER(ctypes.c_uint32), ctypes.c_void_p]
measured.restype = ctypes.c_int32
measured_array = lib.ebullio_measured_array
measured_array.argtypes = [ctypes.c_uint32, ctypes.POINTER(ctypes.c_double), ctypes.c_size_t,
                           ctypes.POINTER(MeasuredColumn), ctypes.c_size_t, ctypes.c_size_t,
                           ctypes.c_uint32, ctypes.c_double] + [
    ctypes.POINTER(ctypes.c_double)] * 3 + [ctypes.c_size_t] + [
    ctypes.POINTER(ctypes.c_double)] * 2 + [ctypes.POINTER(ctypes.c_uint32),
                                            ctypes.POINTER(ctypes.c_int32)]
measured_array.restype = ctypes.c_int32
label = lib.ebullio_measured_input
label.argtypes = [ctypes.c_uint32, ctypes.c_size_t, ctypes.c_char_p, ctypes.c_size_t,
                  ctypes.POINTER(ctypes.c_uint32)]
label.restype = ctypes.c_int32

names = []
for k in range(4):
    buffer, quantity = ctypes.create_string_buffer(64), ctypes.c_uint32(0)
    check(label(SECTION_TEST, k, buffer, 64, ctypes.byref(quantity)) == 0, "input label")
    names.append((buffer.value.decode(), quantity.value))
check(names == [("inlet pressure", 1), ("inlet temperature", 2), ("exhaust pressure", 1),
                ("exhaust temperature", 2)], f"input labels {names}")

readings = [(165.0, 0.25, 0.0, 0), (538.0, 1.0, 0.3, 1), (40.0, 0.08, 0.0, 0),
            (335.0, 1.0, 0.3, 1)]
inputs = (MeasuredInput * 4)(*[MeasuredInput(v, s, r, g, 0) for (v, s, r, g) in readings])
figures, shares = (MeasuredFigure * 3)(), (ctypes.c_double * 12)()
flags = ctypes.c_uint32(99)
status = measured(SECTION_TEST, None, 0, inputs, 4, METRIC, 2.0, figures, 3, None, shares,
                  ctypes.byref(flags), None)
check(status == 0 and flags.value == 0, f"section test status {status}, flags {flags.value}")
check(0.0 < figures[0].value <= 1.0, "efficiency within (0, 1]")
check(all(abs(sum(shares[j * 4:j * 4 + 4]) - 1.0) < 1e-12 for j in range(3)), "shares sum to 1")

# The same readings as columns of one element: the same bits.
def doubles(*values):
    return (ctypes.c_double * len(values))(*values)


keep = [(doubles(v), doubles(s), doubles(r), g) for (v, s, r, g) in readings]
columns = (MeasuredColumn * 4)(*[MeasuredColumn(v, 1, s, 1, r, 1, g, 0) for (v, s, r, g) in keep])
values, standard, expanded = doubles(0, 0, 0), doubles(0, 0, 0), doubles(0, 0, 0)
element_flags, element_status = (ctypes.c_uint32 * 1)(), (ctypes.c_int32 * 1)()
status = measured_array(SECTION_TEST, None, 0, columns, 4, 1, METRIC, 2.0, values, standard,
                        expanded, 3, None, None, element_flags, element_status)
check(status == 0 and element_status[0] == 0, f"array status {status}")
check([values[j] for j in range(3)] == [figures[j].value for j in range(3)], "array values")
check([expanded[j] for j in range(3)] == [figures[j].expanded_uncertainty for j in range(3)],
      "array expanded uncertainties")
# An exhaust 0.05 K above saturation at 40 bar, read to +-1 K: p and T
# cannot tell it from wet steam, so it is flagged.
t_sat, status = cell(T_, PX, 40.0, 0.0, METRIC)
check(status == 0 and abs(t_sat - 250.35) < 0.01, f"Tsat(40 bar) {t_sat}")
near = (MeasuredInput * 4)(*inputs)
near[3].value = t_sat + 0.05
status = measured(SECTION_TEST, None, 0, near, 4, METRIC, 2.0, figures, 3, None, None,
                  ctypes.byref(flags), None)
check(status == 0 and flags.value & NEAR_SATURATION_FLAG, f"near saturation {status} {flags.value}")
check(measured(7777, None, 0, inputs, 4, METRIC, 2.0, figures, 3, None, None, None, None) == 109,
      "unknown calculation")
check(b"measured" in message(109), "message for 109")

print(f"python ctypes: {checks} checks, {failures} failed")
sys.exit(1 if failures else 0)
