"""The demo plant, Tallowmere Station Unit 3 (invented), as a plant rather
than a textbook cycle: its design heat balance with the losses a unit has,
then the same unit from 30 % to 100 % of its throttle flow with sliding
pressure, printed as tables and charted (net heat rate against load).

    python examples/tallowmere_load_curve.py [load_curve.png]

The cycle is examples/tallowmere_cycle.py's (DESIGN.md's Unit 3). The
losses are invented for the demo, none is machine data or a check value:
throttle flow 520 kg/s; generator efficiency 0.987 at rated load, lower
at part load; mechanical losses 1.8 MW; auxiliaries 22 MW besides the
condensate pumps; an exhaust loss curve (invented) over a 30 m² annulus;
0.08 MPa water-side drop per closed heater; valve-stem and gland leaks;
1 % makeup replacing blowdown; and a feed pump driven by its own turbine
on the deaerator's extraction steam, exhausting to the condenser.
"""

import sys

from ebullio.plant import ClosedHeater, Cycle
from ebullio.plant_losses import ExhaustLoss, FeedPumpTurbine, Generator, Leak, Losses, Makeup
from ebullio.plant_off_design import OffDesign

sys.path.insert(0, __file__.rsplit("/", 1)[0])
from tallowmere_cycle import TALLOWMERE  # noqa: E402  (the cycle, shared)

#: The design throttle flow, kg/s (invented).
DESIGN_FLOW = 520.0

#: Exhaust loss (kJ/kg) against annulus velocity (m/s): an invented curve
#: of the usual shape (a minimum near 150 m/s, rising both ways).
EXHAUST_CURVE = [(10.0, 90.0), (60.0, 40.0), (100.0, 25.0), (150.0, 18.0), (200.0, 22.0),
                 (250.0, 34.0), (300.0, 50.0), (400.0, 90.0)]

LOSSES = Losses(
    throttle_flow=DESIGN_FLOW,
    generator=Generator(rated_output=640_000.0,
                        curve=[(0.2, 0.975), (0.5, 0.984), (0.8, 0.987), (1.0, 0.987), (1.2, 0.986)]),
    mechanical_losses=1_800.0,
    auxiliary_power=22_000.0,
    exhaust=ExhaustLoss(30.0, EXHAUST_CURVE),
    water_pressure_drops=[0.8 if isinstance(h, ClosedHeater) else 0.0 for h in TALLOWMERE.heaters],
    leaks=[
        Leak(0.002, casing=0, at="inlet", to=("heater", 1)),      # HP valve stems to heater 2
        Leak(0.004, casing=0, at="exhaust", to=("heater", 4)),    # HP exhaust gland to heater 5
        Leak(0.0015, casing=1, at="inlet", to="condenser"),       # IP inlet gland to the condenser
    ],
    makeup=Makeup(0.01, p=2.0, t=25.0, lost_as="blowdown"),
    feed_pump_turbine=FeedPumpTurbine(steam_from=3, to="condenser", efficiency=0.80),
)

PLANT = Cycle(
    units="metric",
    supply=TALLOWMERE.supply,
    reheat=TALLOWMERE.reheat,
    casings=TALLOWMERE.casings,
    heaters=TALLOWMERE.heaters,
    feed_pressure=TALLOWMERE.feed_pressure,
    feed_pump_efficiency=TALLOWMERE.feed_pump_efficiency,
    condensate_pump_efficiency=TALLOWMERE.condensate_pump_efficiency,
    losses=LOSSES,
)

#: Throttle flows from 30 % to 100 % of design, in 5 % steps.
LOAD_FRACTIONS = [f / 100 for f in range(30, 101, 5)]


def main(png: str) -> None:
    textbook = TALLOWMERE.solve()
    plant = PLANT.solve()
    out, power = plant.output, plant.power
    print("Tallowmere Unit 3 (invented demo plant): design balance with losses\n")
    print(f"{'':34}{'textbook':>12}{'with losses':>14}")
    print(f"{'thermal efficiency':34}{textbook.thermal_efficiency:12.4f}{plant.thermal_efficiency:14.4f}")
    print(f"{'heat rate (cycle) kJ/kWh':34}{textbook.heat_rate_kj_per_kwh:12.0f}{plant.heat_rate_kj_per_kwh:14.0f}")
    print(f"{'gross heat rate kJ/kWh':34}{'':12}{out['gross_heat_rate']:14.0f}")
    print(f"{'net heat rate kJ/kWh':34}{'':12}{out['net_heat_rate']:14.0f}")
    print(f"{'net efficiency':34}{'':12}{out['net_efficiency']:14.4f}")
    print(f"{'exhaust loss kJ/kg':34}{'':12}{out['exhaust_loss']:14.2f}")
    print(f"{'annulus velocity m/s':34}{'':12}{out['annulus_velocity']:14.1f}")
    print("\npowers, MW")
    for name in ("heat_input", "shaft_power", "mechanical_losses", "generator_losses",
                 "gross_output", "motor_pump_power", "auxiliary_power", "net_output"):
        print(f"  {name:32}{power[name] / 1000:12.2f}")

    model = OffDesign(PLANT)
    curve = model.load_curve([DESIGN_FLOW * f for f in LOAD_FRACTIONS], control="sliding")
    frame = curve.frame()
    frame["load"] = frame["net_output_power"] / frame["net_output_power"].max()
    print("\nload curve, sliding pressure")
    columns = ["throttle_flow", "throttle_pressure", "load", "net_output_power", "net_heat_rate",
               "gross_heat_rate", "exhaust_loss", "error"]
    print(frame[columns].to_string(index=False, float_format=lambda v: f"{v:.4g}"))

    try:
        from ebullio.charts import save
    except ImportError:
        print('\n(matplotlib is not installed: no chart; pip install "ebullio[charts]")')
        return
    save(curve.chart(title="Tallowmere Unit 3 (invented), sliding pressure"), png)
    print(f"\nload curve chart written to {png}")


if __name__ == "__main__":
    main(sys.argv[1] if len(sys.argv) > 1 else "load_curve.png")
