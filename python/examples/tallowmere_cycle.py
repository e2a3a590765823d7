"""The demo plant, Tallowmere Station Unit 3 (invented): its heat balance
solved by the ebullio core, printed as tables beside the ideal cycle, and
its T–s diagram and h–s close-up of the expansion saved as PNGs.

    python examples/tallowmere_cycle.py [out.png]

From DESIGN.md: main steam 16.7 MPa / 538 °C, hot reheat 3.7 MPa / 538 °C,
condenser 6.8 kPa, six closed heaters and a deaerator, HP/IP/LP section
efficiencies 0.86 / 0.90 / 0.88, boiler feed pump 0.83. The heater and
casing pressures are those of the Rust demo (core/examples/tallowmere.rs):
HP exhaust (cold reheat) 4.1 MPa, IP exhaust 0.95 MPa; heaters at 6.2,
4.1, 1.9 MPa (closed), 0.95 MPa (deaerator), 0.42, 0.16, 0.065 MPa
(closed); TTD 2.8 K (heater 1: −1.0 K), DCA 5.6 K, drains cascaded
backward, extraction line loss 3 %, no condensate subcooling. Invented
here as in the Rust demo: feed pump discharge 18.6 MPa, the other pumps at 0.78.
Every number is invented for the demo; none is a check value.
"""

import sys

from ebullio.plant import Casing, ClosedHeater, Cycle, OpenHeater, Reheat, Supply


def closed(extraction_bar: float, ttd: float = 2.8) -> ClosedHeater:
    return ClosedHeater(extraction_bar, ttd=ttd, dca=5.6, drains="cascade", line_loss=0.03)


TALLOWMERE = Cycle(
    units="metric",  # bar, °C, kJ/kg
    supply=Supply(p=167.0, t=538.0),
    reheat=Reheat(p=37.0, t=538.0),
    casings=[Casing(41.0, 0.86), Casing(9.5, 0.90), Casing(0.068, 0.88)],
    heaters=[
        closed(62.0, ttd=-1.0),
        closed(41.0),
        closed(19.0),
        OpenHeater(9.5, line_loss=0.03),
        closed(4.2),
        closed(1.6),
        closed(0.65),
    ],
    feed_pressure=186.0,
    feed_pump_efficiency=0.83,
    condensate_pump_efficiency=0.78,
)


def main(png: str) -> None:
    actual = TALLOWMERE.solve()
    ideal = TALLOWMERE.ideal().solve()

    print("Tallowmere Unit 3 (invented demo plant), per kg of throttle steam\n")
    print(f"{'':28}{'actual':>14}{'ideal':>14}")
    for name, a in actual.totals().items():
        print(f"{name:28}{a:14.5g}{ideal.totals()[name]:14.5g}")

    print("\nextraction fractions:", ", ".join(f"{f:.4f}" for f in actual.extraction_fractions))

    print(f"\n{'point':28}{'flow':>8}{'p bar':>10}{'t °C':>9}{'h kJ/kg':>10}{'s kJ/kgK':>10}{'x':>7}")
    for p in actual.points:
        label = f"{p['role']} {p['number']}" if p["number"] else p["role"]
        x = "" if p["x"] is None else f"{p['x']:.4f}"
        print(f"{label:28}{p['flow']:8.4f}{p['p']:10.4g}{p['t']:9.2f}{p['h']:10.2f}"
              f"{p['s']:10.4f}{x:>7}")

    print(f"\n{'component':28}{'heat in':>10}{'work out':>10}{'s gen':>10}")
    for c in actual.components:
        label = f"{c['kind']} {c['number']}" if c["number"] else c["kind"]
        print(f"{label:28}{c['heat_in']:10.2f}{c['work_out']:10.2f}"
              f"{c['entropy_generation']:10.5f}")

    try:
        from ebullio import charts
    except ImportError:
        print('\n(matplotlib is not installed: no charts; pip install "ebullio[charts]")')
        return
    title = "Tallowmere Unit 3 (invented)"
    stem = png[:-4] if png.endswith(".png") else png
    close_up = f"{stem}_expansion.png"
    charts.save(charts.t_s_diagram(actual, isobars=[167.0, 37.0, 9.5, 0.068], title=title), png)
    charts.save(charts.expansion_diagram(actual, title=f"{title}: turbine expansion"), close_up)
    print(f"\nT–s diagram written to {png}, the h–s close-up of the expansion to {close_up}")


if __name__ == "__main__":
    main(sys.argv[1] if len(sys.argv) > 1 else "tallowmere_ts.png")
