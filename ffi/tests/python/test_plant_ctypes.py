"""The plant calls through ctypes, each struct declared by hand from the
header the way a macro module's type declarations would be: the demo plant
solved by ebullio_cycle_solve and compared bit for bit with the Rust core's
own numbers (the plant_reference example's output), and a refusal.
The structs are declared in their version-1 layout, which ends before the
losses and the plant output: an older caller, whose results stay the same.
Standard library only.
Usage: python3 test_plant_ctypes.py path/to/libebullio_c.so REFERENCE
"""
import ctypes
import math
import struct
import sys

lib = ctypes.CDLL(sys.argv[1])
with open(sys.argv[2]) as f:
    reference = [struct.unpack("<d", struct.pack("<Q", int(line, 16)))[0] for line in f]

MAX_CASINGS, MAX_HEATERS, MAX_POINTS, MAX_COMPONENTS, MAX_STREAMS = 4, 12, 92, 80, 3
METRIC = 2
SUPERHEATED = 1
CLOSED, OPEN = 1, 2
CASCADE_BACKWARD = 1
OK, INVALID_PLANT, UNKNOWN_PLANT_CODE = 0, 206, 108
u32, f64 = ctypes.c_uint32, ctypes.c_double


class Casing(ctypes.Structure):
    _fields_ = [("exhaust_pressure", f64), ("isentropic_efficiency", f64)]


class Heater(ctypes.Structure):
    _fields_ = [("kind", u32), ("drains", u32), ("has_drain_cooler", u32), ("reserved", u32),
                ("extraction_pressure", f64), ("extraction_line_loss", f64),
                ("terminal_temperature_difference", f64), ("drain_cooler_approach", f64)]


class CycleSpec(ctypes.Structure):
    _fields_ = [("size", u32), ("units", u32), ("supply_kind", u32), ("has_reheat", u32),
                ("has_feed_pressure", u32), ("casing_count", u32), ("heater_count", u32),
                ("reserved", u32), ("supply_pressure", f64), ("supply_temperature", f64),
                ("reheat_pressure", f64), ("reheat_temperature", f64), ("feed_pressure", f64),
                ("feed_pump_efficiency", f64), ("condensate_pump_efficiency", f64),
                ("condensate_subcooling", f64), ("casings", Casing * MAX_CASINGS),
                ("heaters", Heater * MAX_HEATERS)]


class Point(ctypes.Structure):
    _fields_ = [("role", u32), ("number", u32), ("phase", u32), ("region", u32),
                ("flow", f64), ("pressure", f64), ("temperature", f64), ("enthalpy", f64),
                ("entropy", f64), ("quality", f64)]


class Stream(ctypes.Structure):
    _fields_ = [("flow", f64), ("enthalpy", f64), ("entropy", f64)]


class Component(ctypes.Structure):
    _fields_ = [("kind", u32), ("number", u32), ("inlet_count", u32), ("outlet_count", u32),
                ("heat_in", f64), ("work_out", f64), ("entropy_generation", f64),
                ("inlets", Stream * MAX_STREAMS), ("outlets", Stream * MAX_STREAMS)]


TOTALS = ["turbine_work", "pump_work", "net_work", "boiler_heat", "reheat_heat", "heat_input",
          "condenser_duty", "thermal_efficiency", "heat_rate_kj_per_kwh",
          "heat_rate_btu_per_kwh", "steam_rate_kg_per_kwh", "steam_rate_lbm_per_kwh",
          "back_work_ratio", "carnot_efficiency"]


class CycleResult(ctypes.Structure):
    _fields_ = ([("size", u32), ("units", u32), ("point_count", u32), ("component_count", u32)]
                + [(name, f64) for name in TOTALS]
                + [("extraction_fractions", f64 * MAX_HEATERS), ("points", Point * MAX_POINTS),
                   ("components", Component * MAX_COMPONENTS)])


class ErrorDetail(ctypes.Structure):
    _fields_ = [("size", u32), ("status", ctypes.c_int32), ("quantity", u32), ("units", u32),
                ("value", f64), ("min", f64), ("max", f64), ("message", ctypes.c_char * 192)]


solve = lib.ebullio_cycle_solve
solve.argtypes = [ctypes.POINTER(CycleSpec), ctypes.POINTER(CycleResult),
                  ctypes.POINTER(ErrorDetail)]
solve.restype = ctypes.c_int32

checks = failures = 0


def check(ok, what):
    global checks, failures
    checks += 1
    if not ok:
        failures += 1
        print("check failed:", what)


def tallowmere():
    """The demo plant (invented), as ffi/examples/plant_reference.rs builds it."""
    s = CycleSpec()
    s.size = ctypes.sizeof(CycleSpec)
    s.units, s.supply_kind = METRIC, SUPERHEATED
    s.supply_pressure, s.supply_temperature = 167.0, 538.0
    s.has_reheat, s.reheat_pressure, s.reheat_temperature = 1, 37.0, 538.0
    s.has_feed_pressure, s.feed_pressure = 1, 187.0
    s.feed_pump_efficiency, s.condensate_pump_efficiency = 0.83, 0.80
    casings = [(41.0, 0.86), (9.5, 0.90), (0.068, 0.88)]
    s.casing_count = len(casings)
    for slot, (p, eta) in zip(s.casings, casings):
        slot.exhaust_pressure, slot.isentropic_efficiency = p, eta
    heaters = [(62.0, False, -1.0), (41.0, False, 2.8), (19.0, False, 2.8), (9.5, True, 0.0),
               (4.2, False, 2.8), (1.6, False, 2.8), (0.65, False, 2.8)]
    s.heater_count = len(heaters)
    for slot, (p, is_open, ttd) in zip(s.heaters, heaters):
        slot.extraction_pressure, slot.extraction_line_loss = p, 0.03
        if is_open:
            slot.kind = OPEN
        else:
            slot.kind, slot.drains = CLOSED, CASCADE_BACKWARD
            slot.terminal_temperature_difference = ttd
            slot.has_drain_cooler, slot.drain_cooler_approach = 1, 5.6
    return s


def bits(x):
    return struct.pack("<d", x)


check(ctypes.sizeof(CycleSpec) == 96 + 16 * MAX_CASINGS + 48 * MAX_HEATERS, "spec layout")
check(ctypes.sizeof(CycleResult) == 128 + 8 * MAX_HEATERS + 64 * MAX_POINTS
      + 184 * MAX_COMPONENTS, "result layout")

spec = tallowmere()
result = CycleResult()
result.size = ctypes.sizeof(CycleResult)
detail = ErrorDetail()
detail.size = ctypes.sizeof(ErrorDetail)
check(solve(ctypes.byref(spec), ctypes.byref(result), ctypes.byref(detail)) == OK, "solve")
ours = [getattr(result, name) for name in TOTALS]
ours += [float(result.point_count), float(result.component_count)]
ours += list(result.extraction_fractions[: spec.heater_count])
for p in result.points[: result.point_count]:
    ours += [p.flow, p.pressure, p.temperature, p.enthalpy, p.entropy, p.quality]
for c in result.components[: result.component_count]:
    ours += [c.heat_in, c.work_out, c.entropy_generation]
    for s in list(c.inlets[: c.inlet_count]) + list(c.outlets[: c.outlet_count]):
        ours += [s.flow, s.enthalpy, s.entropy]
check(len(ours) == len(reference), f"{len(ours)} numbers, the core printed {len(reference)}")
for k, (a, b) in enumerate(zip(ours, reference)):
    check(bits(a) == bits(b), f"number {k}: {a!r} vs the core's {b!r}")
check(math.isnan(result.points[0].quality), "throttle steam is single phase: x is NaN")

# A refusal: an efficiency above 1, with the core's reason in the detail.
spec.casings[2].isentropic_efficiency = 1.2
before = bytes(result)
status = solve(ctypes.byref(spec), ctypes.byref(result), ctypes.byref(detail))
check(status == INVALID_PLANT and detail.status == INVALID_PLANT, f"status {status}")
check(b"isentropic efficiency" in detail.message, detail.message)
check(bytes(result) == before, "result untouched on failure")
spec.casings[2].isentropic_efficiency = 0.88
spec.supply_kind = 9
check(solve(ctypes.byref(spec), ctypes.byref(result), None) == UNKNOWN_PLANT_CODE, "unknown code")

print(f"plant ctypes: {checks} checks, {failures} failed")
sys.exit(1 if failures else 0)
