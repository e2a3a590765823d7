/*
 * The plant calls of the C ABI from C99: the demo plant solved through
 * ebullio_cycle_solve and compared bit for bit with the Rust core's own
 * numbers (printed by `cargo run --example plant_reference`, the file
 * named by argv[1]); the same plant with every loss, off its design point
 * and along a load curve, against the core's numbers too (printed by
 * `cargo run --example plant_reference -- off-design`, the file named by
 * argv[2]); a recalled textbook cycle; the turbine and pump calls; and
 * the refusals. Built by ffi/tests/run.sh with
 *   -std=c99 -Wall -Wextra -Werror -pedantic
 */
#include <inttypes.h>
#include <math.h>
#include <stddef.h>
#include <stdint.h>
#include <stdio.h>
#include <string.h>

#include "ebullio.h"

static int checks = 0;
static int failures = 0;

#define CHECK(cond)                                                        \
    do {                                                                   \
        ++checks;                                                          \
        if (!(cond)) {                                                     \
            ++failures;                                                    \
            fprintf(stderr, "%s:%d: check failed: %s\n", __FILE__,         \
                    __LINE__, #cond);                                      \
        }                                                                  \
    } while (0)

#define CHECK_STATUS(got, want)                                            \
    do {                                                                   \
        EbullioStatus got_ = (got);                                        \
        ++checks;                                                          \
        if (got_ != (want)) {                                              \
            ++failures;                                                    \
            fprintf(stderr, "%s:%d: status %d (%s), expected %s\n",        \
                    __FILE__, __LINE__, (int)got_,                         \
                    ebullio_status_message(got_), #want);                  \
        }                                                                  \
    } while (0)

/* Large blocks live in static storage, not on the stack. */
static EbullioCycleSpec spec;
static EbullioCycleResult result;
static EbullioCycleResult other;
static EbullioLoadCurve curve;

/* The demo plant (invented): Tallowmere Unit 3, metric engineering units
   (bar, degC). Feed pressure 187 bar and condensate pump 0.80 are invented
   beside DESIGN.md's numbers, as in ffi/examples/plant_reference.rs. */
static void tallowmere(EbullioCycleSpec *s) {
    static const double casings[3][2] = {{41.0, 0.86}, {9.5, 0.90}, {0.068, 0.88}};
    static const double heaters[7][3] = {/* extraction bar, open?, TTD K */
                                         {62.0, 0, -1.0}, {41.0, 0, 2.8}, {19.0, 0, 2.8},
                                         {9.5, 1, 0.0},   {4.2, 0, 2.8},  {1.6, 0, 2.8},
                                         {0.65, 0, 2.8}};
    unsigned i;
    memset(s, 0, sizeof *s);
    s->size = (uint32_t)sizeof *s;
    s->units = EBULLIO_UNITS_METRIC_ENGINEERING;
    s->supply_kind = EBULLIO_SUPPLY_KIND_SUPERHEATED;
    s->supply_pressure = 167.0;
    s->supply_temperature = 538.0;
    s->has_reheat = 1;
    s->reheat_pressure = 37.0;
    s->reheat_temperature = 538.0;
    s->has_feed_pressure = 1;
    s->feed_pressure = 187.0;
    s->feed_pump_efficiency = 0.83;
    s->condensate_pump_efficiency = 0.80;
    s->condensate_subcooling = 0.0;
    s->casing_count = 3;
    for (i = 0; i < 3; ++i) {
        s->casings[i].exhaust_pressure = casings[i][0];
        s->casings[i].isentropic_efficiency = casings[i][1];
    }
    s->heater_count = 7;
    for (i = 0; i < 7; ++i) {
        EbullioHeater *h = &s->heaters[i];
        h->extraction_pressure = heaters[i][0];
        h->extraction_line_loss = 0.03;
        if (heaters[i][1] != 0.0) {
            h->kind = EBULLIO_HEATER_KIND_OPEN;
        } else {
            h->kind = EBULLIO_HEATER_KIND_CLOSED;
            h->drains = EBULLIO_DRAINS_CASCADE_BACKWARD;
            h->terminal_temperature_difference = heaters[i][2];
            h->has_drain_cooler = 1;
            h->drain_cooler_approach = 5.6;
        }
    }
}

static FILE *reference;

/* The next number the Rust core printed, as its bits. */
static uint64_t next_bits(void) {
    uint64_t bits = 0;
    if (fscanf(reference, "%" SCNx64, &bits) != 1) {
        ++failures;
        fprintf(stderr, "reference file ended early\n");
    }
    return bits;
}

static void same(const char *what, double value) {
    uint64_t want = next_bits(), got;
    memcpy(&got, &value, sizeof got);
    ++checks;
    if (got != want) {
        ++failures;
        fprintf(stderr, "%s: %.17g has bits %016" PRIx64 ", the core's are %016" PRIx64 "\n",
                what, value, got, want);
    }
}

static void stream(const EbullioStream *s) {
    same("stream flow", s->flow);
    same("stream enthalpy", s->enthalpy);
    same("stream entropy", s->entropy);
}

static void demo_plant_bit_for_bit(void) {
    EbullioErrorDetail why;
    uint32_t i, j;
    tallowmere(&spec);
    memset(&why, 0, sizeof why);
    why.size = (uint32_t)sizeof why;
    memset(&result, 0, sizeof result);
    result.size = (uint32_t)sizeof result;
    CHECK_STATUS(ebullio_cycle_solve(&spec, &result, &why), EBULLIO_STATUS_OK);
    CHECK(result.units == EBULLIO_UNITS_METRIC_ENGINEERING);
    CHECK(result.size == sizeof result);
    same("turbine work", result.turbine_work);
    same("pump work", result.pump_work);
    same("net work", result.net_work);
    same("boiler heat", result.boiler_heat);
    same("reheat heat", result.reheat_heat);
    same("heat input", result.heat_input);
    same("condenser duty", result.condenser_duty);
    same("thermal efficiency", result.thermal_efficiency);
    same("heat rate kJ/kWh", result.heat_rate_kj_per_kwh);
    same("heat rate Btu/kWh", result.heat_rate_btu_per_kwh);
    same("steam rate kg/kWh", result.steam_rate_kg_per_kwh);
    same("steam rate lbm/kWh", result.steam_rate_lbm_per_kwh);
    same("back work ratio", result.back_work_ratio);
    same("Carnot efficiency", result.carnot_efficiency);
    same("point count", (double)result.point_count);
    same("component count", (double)result.component_count);
    for (i = 0; i < spec.heater_count; ++i) {
        same("extraction fraction", result.extraction_fractions[i]);
    }
    for (i = 0; i < result.point_count; ++i) {
        const EbullioCyclePoint *p = &result.points[i];
        same("point flow", p->flow);
        same("point pressure", p->pressure);
        same("point temperature", p->temperature);
        same("point enthalpy", p->enthalpy);
        same("point entropy", p->entropy);
        same("point quality", p->quality);
        CHECK(p->role >= EBULLIO_POINT_ROLE_THROTTLE && p->role <= EBULLIO_POINT_ROLE_BOILER_INLET);
        CHECK(isnan(p->quality) == (p->phase != EBULLIO_PHASE_WET_STEAM &&
                                    p->phase != EBULLIO_PHASE_SATURATED_LIQUID &&
                                    p->phase != EBULLIO_PHASE_SATURATED_VAPOUR));
    }
    CHECK(result.points[0].role == EBULLIO_POINT_ROLE_THROTTLE);
    CHECK(result.points[result.point_count].role == 0);
    for (i = 0; i < result.component_count; ++i) {
        const EbullioCycleComponent *c = &result.components[i];
        same("heat in", c->heat_in);
        same("work out", c->work_out);
        same("entropy generation", c->entropy_generation);
        for (j = 0; j < c->inlet_count; ++j) {
            stream(&c->inlets[j]);
        }
        for (j = 0; j < c->outlet_count; ++j) {
            stream(&c->outlets[j]);
        }
    }
}

/* The demo plant's design throttle flow, kg/s (invented). */
#define DESIGN_FLOW 520.0

/* Every loss of the demo plant (invented numbers, as `with_losses` in
   ffi/examples/plant_reference.rs): 520 kg/s, a generator of 0.987,
   1.8 MW mechanical, 14 MW auxiliaries, an exhaust loss on 30 m2 of
   annulus, 0.8 bar on each closed heater's tubes, four leakages, 1 %
   makeup for blowdown, a feed pump turbine on heater 4's steam. */
static void with_losses(EbullioCycleSpec *s) {
    static const double exhaust[8][2] = {/* m/s, kJ/kg: invented, not machine data */
                                         {10.0, 90.0},  {60.0, 40.0},  {100.0, 25.0},
                                         {150.0, 18.0}, {200.0, 22.0}, {250.0, 34.0},
                                         {300.0, 50.0}, {400.0, 90.0}};
    static const EbullioLeak leaks[4] = {
        {EBULLIO_LEAK_SOURCE_CASING_INLET, 0, EBULLIO_STEAM_DESTINATION_HEATER_SHELL, 1, 0.002},
        {EBULLIO_LEAK_SOURCE_CASING_EXHAUST, 0, EBULLIO_STEAM_DESTINATION_HEATER_SHELL, 5, 0.001},
        {EBULLIO_LEAK_SOURCE_CASING_INLET, 0, EBULLIO_STEAM_DESTINATION_CASING_INLET, 1, 0.01},
        {EBULLIO_LEAK_SOURCE_CASING_INLET, 2, EBULLIO_STEAM_DESTINATION_CONDENSER, 0, 0.001}};
    unsigned i;
    tallowmere(s);
    s->has_throttle_flow = 1;
    s->throttle_flow = DESIGN_FLOW;
    s->generator_kind = EBULLIO_GENERATOR_KIND_CONSTANT;
    s->generator_efficiency = 0.987;
    s->mechanical_losses = 1800.0;
    s->auxiliary_power = 14000.0;
    s->has_exhaust_loss = 1;
    s->exhaust_annulus_area = 30.0;
    s->exhaust_curve_count = 8;
    for (i = 0; i < 8; ++i) {
        s->exhaust_curve[i].x = exhaust[i][0];
        s->exhaust_curve[i].y = exhaust[i][1];
    }
    for (i = 0; i < 7; ++i) {
        s->heater_water_pressure_drops[i] = s->heaters[i].kind == EBULLIO_HEATER_KIND_OPEN ? 0.0 : 0.8;
    }
    s->leak_count = 4;
    memcpy(s->leaks, leaks, sizeof leaks);
    s->has_makeup = 1;
    s->makeup_fraction = 0.01;
    s->makeup_pressure = 2.0;
    s->makeup_temperature = 25.0;
    s->makeup_lost_as = EBULLIO_WATER_LOSS_BLOWDOWN;
    s->has_feed_pump_turbine = 1;
    s->feed_pump_turbine_steam_from = 3;
    s->feed_pump_turbine_exhaust_to = EBULLIO_STEAM_DESTINATION_CONDENSER;
    s->feed_pump_turbine_efficiency = 0.8;
}

static void totals(const EbullioCycleResult *r) {
    same("turbine work", r->turbine_work);
    same("pump work", r->pump_work);
    same("net work", r->net_work);
    same("boiler heat", r->boiler_heat);
    same("reheat heat", r->reheat_heat);
    same("heat input", r->heat_input);
    same("condenser duty", r->condenser_duty);
    same("thermal efficiency", r->thermal_efficiency);
    same("heat rate kJ/kWh", r->heat_rate_kj_per_kwh);
    same("heat rate Btu/kWh", r->heat_rate_btu_per_kwh);
    same("steam rate kg/kWh", r->steam_rate_kg_per_kwh);
    same("steam rate lbm/kWh", r->steam_rate_lbm_per_kwh);
    same("back work ratio", r->back_work_ratio);
    same("Carnot efficiency", r->carnot_efficiency);
}

static void output(const EbullioPlantOutput *o) {
    same("shaft work", o->shaft_work);
    same("generator efficiency", o->generator_efficiency);
    same("gross output", o->gross_output);
    same("motor pump work", o->motor_pump_work);
    same("net output", o->net_output);
    same("net efficiency", o->net_efficiency);
    same("gross heat rate", o->gross_heat_rate);
    same("net heat rate", o->net_heat_rate);
    same("expansion line end", o->expansion_line_end);
    same("exhaust loss", o->exhaust_loss);
    same("annulus velocity", o->annulus_velocity);
    same("throttle flow", o->power.throttle_flow);
    same("heat input power", o->power.heat_input);
    same("condenser duty power", o->power.condenser_duty);
    same("shaft power", o->power.shaft_power);
    same("mechanical losses", o->power.mechanical_losses);
    same("generator losses", o->power.generator_losses);
    same("gross output power", o->power.gross_output);
    same("motor pump power", o->power.motor_pump_power);
    same("auxiliary power", o->power.auxiliary_power);
    same("net output power", o->power.net_output);
    /* Every loss takes its share: net < gross < shaft power. */
    CHECK(o->has_power == 1);
    CHECK(o->power.net_output < o->power.gross_output &&
          o->power.gross_output < o->power.shaft_power);
}

static void operating_point(EbullioOperatingPoint *p, double flow, uint32_t control) {
    memset(p, 0, sizeof *p);
    p->size = (uint32_t)sizeof *p;
    p->control = control;
    p->condenser = EBULLIO_CONDENSER_CONDITION_DESIGN;
    p->throttle_flow = flow;
}

/* The demo plant with every loss at design, at 80 % flow on sliding
   pressure, along a load curve at fixed pressure (the 110 % row refused:
   the valves wide open pass less) and at 75 % of its net output, bit for
   bit with the core; an older caller's smaller blocks. */
static void losses_and_off_design(void) {
    static const double flows[5] = {0.4 * DESIGN_FLOW, 0.6 * DESIGN_FLOW, 0.8 * DESIGN_FLOW,
                                     1.0 * DESIGN_FLOW, 1.1 * DESIGN_FLOW};
    EbullioOperatingPoint point;
    EbullioOffDesignOptions none;
    EbullioErrorDetail why;
    double target;
    uint32_t i;
    memset(&why, 0, sizeof why);
    why.size = (uint32_t)sizeof why;
    memset(&none, 0, sizeof none);
    none.size = (uint32_t)sizeof none;
    with_losses(&spec);
    memset(&result, 0, sizeof result);
    result.size = (uint32_t)sizeof result;
    CHECK_STATUS(ebullio_cycle_solve(&spec, &result, &why), EBULLIO_STATUS_OK);
    output(&result.output);
    target = 0.75 * result.output.power.net_output;

    operating_point(&point, 0.8 * DESIGN_FLOW, EBULLIO_THROTTLE_CONTROL_SLIDING_PRESSURE);
    memset(&other, 0, sizeof other);
    other.size = (uint32_t)sizeof other;
    CHECK_STATUS(ebullio_off_design_solve(&spec, NULL, &point, &other, &why), EBULLIO_STATUS_OK);
    totals(&other);
    output(&other.output);
    /* Sliding pressure: the throttle pressure falls with the flow. */
    CHECK(other.points[0].role == EBULLIO_POINT_ROLE_THROTTLE && other.points[0].pressure < 167.0);

    operating_point(&point, 0.0, EBULLIO_THROTTLE_CONTROL_FIXED_PRESSURE);
    memset(&curve, 0, sizeof curve);
    curve.size = (uint32_t)sizeof curve;
    CHECK_STATUS(ebullio_load_curve(&spec, &none, &point, flows, 5, &curve, &why),
                 EBULLIO_STATUS_OK);
    CHECK(curve.row_count == 5 && curve.units == EBULLIO_UNITS_METRIC_ENGINEERING);
    for (i = 0; i < 4; ++i) {
        const EbullioLoadPoint *row = &curve.rows[i];
        CHECK_STATUS(row->status, EBULLIO_STATUS_OK);
        CHECK(row->throttle_flow == flows[i]);
        same("throttle pressure", row->throttle_pressure);
        same("thermal efficiency", row->thermal_efficiency);
        output(&row->output);
        /* The boiler holds the design throttle pressure. */
        CHECK(row->throttle_pressure == 167.0);
        /* The heat rate rises as the load falls (issue 16's check on the
           demo unit; throttling and lower pressures at part load, common
           practice). */
        CHECK(i == 0 || row->output.net_heat_rate < curve.rows[i - 1].output.net_heat_rate);
    }
    CHECK_STATUS(curve.rows[4].status, EBULLIO_STATUS_INVALID_PLANT);
    CHECK(curve.rows[4].throttle_flow == flows[4] && curve.rows[5].throttle_flow == 0.0);

    operating_point(&point, 0.0, EBULLIO_THROTTLE_CONTROL_SLIDING_PRESSURE);
    CHECK_STATUS(ebullio_output_solve(&spec, NULL, &point, target, &other, &why),
                 EBULLIO_STATUS_OK);
    totals(&other);
    output(&other.output);
    /* The flow found gives the target, to the solver's 1e-10. */
    CHECK(fabs(other.output.power.net_output - target) <= 1e-9 * target);

    /* Refusals: a flow above the valves' at fixed pressure (the core's
       reason in the detail), a control that is no code, too many flows. */
    operating_point(&point, 1.1 * DESIGN_FLOW, EBULLIO_THROTTLE_CONTROL_FIXED_PRESSURE);
    other.turbine_work = -1.0;
    CHECK_STATUS(ebullio_off_design_solve(&spec, NULL, &point, &other, &why),
                 EBULLIO_STATUS_INVALID_PLANT);
    CHECK(why.status == EBULLIO_STATUS_INVALID_PLANT);
    CHECK(strstr(why.message, "control valves") != NULL);
    point.control = 7;
    CHECK_STATUS(ebullio_off_design_solve(&spec, NULL, &point, &other, NULL),
                 EBULLIO_STATUS_UNKNOWN_PLANT_CODE);
    CHECK_STATUS(ebullio_load_curve(&spec, NULL, &point, flows, EBULLIO_MAX_LOAD_POINTS + 1,
                                    &curve, NULL),
                 EBULLIO_STATUS_BAD_LENGTH);
    CHECK(other.turbine_work == -1.0);

    /* An older caller: its description ends before the losses, its
       result before the output. The losses set in memory are not read
       (the lossless plant's bits), the output is not written. */
    spec.size = (uint32_t)offsetof(EbullioCycleSpec, has_throttle_flow);
    memset(&other, 0, sizeof other);
    other.size = (uint32_t)offsetof(EbullioCycleResult, output);
    other.output.net_output = -1.0;
    CHECK_STATUS(ebullio_cycle_solve(&spec, &other, NULL), EBULLIO_STATUS_OK);
    tallowmere(&spec);
    memset(&result, 0, sizeof result);
    result.size = (uint32_t)sizeof result;
    CHECK_STATUS(ebullio_cycle_solve(&spec, &result, NULL), EBULLIO_STATUS_OK);
    CHECK(memcmp((const char *)&other + 4, (const char *)&result + 4,
                 offsetof(EbullioCycleResult, output) - 4) == 0);
    CHECK(other.output.net_output == -1.0);
    CHECK(result.output.has_power == 0 && result.output.net_output == result.net_work);
}

static void textbook_cycle(void) {
    /* recalled from Cengel & Boles, Thermodynamics: An Engineering Approach,
       Example 10-1: ideal Rankine cycle, 3 MPa, 350 degC, condenser 75 kPa;
       thermal efficiency 26.0 %, turbine exhaust quality 0.886. */
    memset(&spec, 0, sizeof spec);
    spec.size = (uint32_t)sizeof spec;
    spec.units = EBULLIO_UNITS_NATIVE;
    spec.supply_kind = EBULLIO_SUPPLY_KIND_SUPERHEATED;
    spec.supply_pressure = 3.0;
    spec.supply_temperature = 623.15;
    spec.feed_pump_efficiency = 1.0;
    spec.condensate_pump_efficiency = 1.0;
    spec.casing_count = 1;
    spec.casings[0].exhaust_pressure = 0.075;
    spec.casings[0].isentropic_efficiency = 1.0;
    memset(&result, 0, sizeof result);
    result.size = (uint32_t)sizeof result;
    CHECK_STATUS(ebullio_cycle_solve(&spec, &result, NULL), EBULLIO_STATUS_OK);
    CHECK(fabs(result.thermal_efficiency - 0.260) <= 0.0015);
    CHECK(result.points[1].role == EBULLIO_POINT_ROLE_CASING_EXHAUST);
    CHECK(fabs(result.points[1].quality - 0.886) <= 0.002);
    CHECK(result.reheat_heat == 0.0);
}

static void components(void) {
    EbullioExpansion e;
    EbullioCompression c;
    EbullioState exhaust, ideal, before;
    EbullioErrorDetail why;
    memset(&e, 0, sizeof e);
    e.size = (uint32_t)sizeof e;
    memset(&exhaust, 0, sizeof exhaust);
    exhaust.size = (uint32_t)sizeof exhaust;
    ideal = exhaust;
    memset(&why, 0, sizeof why);
    why.size = (uint32_t)sizeof why;
    /* The demo plant's HP casing, 167 bar / 538 degC to 41 bar at 0.86. */
    CHECK_STATUS(ebullio_turbine_expansion(EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, 167.0, 538.0,
                                           41.0, 0.86, EBULLIO_UNITS_METRIC_ENGINEERING, &e,
                                           &exhaust, &ideal, &why),
                 EBULLIO_STATUS_OK);
    CHECK(fabs(e.isentropic_efficiency - 0.86) < 1e-12);
    CHECK(exhaust.pressure == 41.0 && ideal.pressure == 41.0);
    CHECK(e.work > 0.0 && e.work < e.isentropic_work);
    CHECK(e.entropy_generation > 0.0);
    /* The section measured at both ends gives its efficiency back. */
    CHECK_STATUS(ebullio_section_efficiency(167.0, 538.0, 41.0, exhaust.temperature,
                                            EBULLIO_UNITS_METRIC_ENGINEERING, &e, NULL, NULL,
                                            NULL),
                 EBULLIO_STATUS_OK);
    CHECK(fabs(e.isentropic_efficiency - 0.86) < 1e-9);
    /* An LP exhaust read at its saturation temperature is wet: refused. */
    before = exhaust;
    CHECK_STATUS(ebullio_section_efficiency(9.5, 350.0, 0.068, 38.0,
                                            EBULLIO_UNITS_METRIC_ENGINEERING, &e, &exhaust, NULL,
                                            &why),
                 EBULLIO_STATUS_NOT_FIXED_BY_MEASUREMENT);
    CHECK(why.status == EBULLIO_STATUS_NOT_FIXED_BY_MEASUREMENT);
    CHECK(strstr(why.message, "wet") != NULL);
    CHECK(memcmp(&exhaust, &before, sizeof exhaust) == 0);
    /* The boiler feed pump from saturated liquid at 9.215 bar. */
    memset(&c, 0, sizeof c);
    c.size = (uint32_t)sizeof c;
    CHECK_STATUS(ebullio_pump_compression(EBULLIO_INPUT_PAIR_PRESSURE_QUALITY, 9.215, 0.0, 187.0,
                                          0.83, EBULLIO_UNITS_METRIC_ENGINEERING, &c, &exhaust,
                                          NULL, NULL),
                 EBULLIO_STATUS_OK);
    /* Pump work is a small difference of enthalpies, each exact to about
       1e-13 relative: 1e-9 on the efficiency. */
    CHECK(fabs(c.isentropic_efficiency - 0.83) < 1e-9);
    CHECK(c.work > c.isentropic_work && c.isentropic_work > 0.0);
    CHECK(exhaust.phase == EBULLIO_PHASE_COMPRESSED_LIQUID);
    /* Refusals. */
    CHECK_STATUS(ebullio_turbine_expansion(1, 167.0, 538.0, 41.0, 1.3, 2, &e, NULL, NULL, &why),
                 EBULLIO_STATUS_INVALID_PLANT);
    CHECK(why.status == EBULLIO_STATUS_INVALID_PLANT);
    CHECK_STATUS(ebullio_turbine_expansion(1, 167.0, 538.0, 41.0, 0.9, 2, NULL, NULL, NULL, NULL),
                 EBULLIO_STATUS_NULL_POINTER);
    CHECK_STATUS(ebullio_pump_compression(1, 9.5, 300.0, 187.0, 0.83, 2, &c, NULL, NULL, NULL),
                 EBULLIO_STATUS_INVALID_PLANT);
}

/* A closed heater and a deaerator of the demo's kind (invented numbers):
   the approach temperatures hold and each energy balance closes, from
   the states the calls return. */
static void heaters(void) {
    EbullioHeaterBalance b;
    EbullioState fw_out, drain;
    double t_sat, heat_in;
    memset(&b, 0, sizeof b);
    b.size = (uint32_t)sizeof b;
    memset(&fw_out, 0, sizeof fw_out);
    fw_out.size = (uint32_t)sizeof fw_out;
    drain = fw_out;
    CHECK_STATUS(ebullio_closed_heater(4.074, 2962.65, 9.215, 109.58, 385.47, 21.11, 18.43,
                                       786.84, 2.8, 1, 5.6, EBULLIO_UNITS_METRIC_ENGINEERING, &b,
                                       &fw_out, &drain, NULL),
                 EBULLIO_STATUS_OK);
    t_sat = ebullio_property(EBULLIO_PROPERTY_TEMPERATURE, EBULLIO_INPUT_PAIR_PRESSURE_QUALITY,
                             4.074, 0.0, EBULLIO_UNITS_METRIC_ENGINEERING, 0, NULL);
    CHECK(fabs(t_sat - fw_out.temperature - 2.8) < 1e-9);
    CHECK(fabs(drain.temperature - 109.58 - 5.6) < 1e-9);
    heat_in = b.balancing_flow * (2962.65 - drain.enthalpy) + 21.11 * (786.84 - drain.enthalpy);
    CHECK(fabs(heat_in - b.duty) < 1e-9 * b.duty);
    CHECK(b.entropy_generation > 0.0);
    CHECK_STATUS(ebullio_open_heater(9.215, 3145.88, 9.215, 141.0, 503.22, 0.0, 0.0, 0.0,
                                     EBULLIO_UNITS_METRIC_ENGINEERING, &b, &fw_out, NULL),
                 EBULLIO_STATUS_OK);
    CHECK(fw_out.phase == EBULLIO_PHASE_SATURATED_LIQUID);
    CHECK(fabs(b.balancing_flow + b.through_flow - 503.22) < 1e-9);
    CHECK_STATUS(ebullio_attemperator_spray(167.0, 560.0, 500.0, 186.0, 180.0, 600.0,
                                            EBULLIO_UNITS_METRIC_ENGINEERING, &b, NULL, NULL),
                 EBULLIO_STATUS_INVALID_PLANT);
}

static void refusals(void) {
    EbullioErrorDetail why;
    double marked;
    memset(&why, 0, sizeof why);
    why.size = (uint32_t)sizeof why;
    memset(&result, 0, sizeof result);
    result.size = (uint32_t)sizeof result;
    result.turbine_work = -1.0;
    marked = result.turbine_work;
    tallowmere(&spec);
    spec.casings[1].isentropic_efficiency = 1.5;
    CHECK_STATUS(ebullio_cycle_solve(&spec, &result, &why), EBULLIO_STATUS_INVALID_PLANT);
    CHECK(why.status == EBULLIO_STATUS_INVALID_PLANT);
    CHECK(strstr(why.message, "isentropic efficiency") != NULL);
    tallowmere(&spec);
    spec.heaters[2].drains = 7;
    CHECK_STATUS(ebullio_cycle_solve(&spec, &result, NULL), EBULLIO_STATUS_UNKNOWN_PLANT_CODE);
    tallowmere(&spec);
    spec.heater_count = EBULLIO_MAX_HEATERS + 1;
    CHECK_STATUS(ebullio_cycle_solve(&spec, &result, NULL), EBULLIO_STATUS_BAD_LENGTH);
    tallowmere(&spec);
    spec.size = 8;
    CHECK_STATUS(ebullio_cycle_solve(&spec, &result, NULL), EBULLIO_STATUS_BAD_STRUCT_SIZE);
    tallowmere(&spec);
    CHECK_STATUS(ebullio_cycle_solve(NULL, &result, &why), EBULLIO_STATUS_NULL_POINTER);
    CHECK_STATUS(ebullio_cycle_solve(&spec, NULL, NULL), EBULLIO_STATUS_NULL_POINTER);
    CHECK(result.turbine_work == marked);
}

/* Every number of the reference file compared. */
static void reference_used_up(void) {
    uint64_t extra;
    CHECK(fscanf(reference, "%" SCNx64, &extra) == EOF);
    fclose(reference);
}

int main(int argc, char **argv) {
    if (argc != 3 || !(reference = fopen(argv[1], "r"))) {
        fprintf(stderr, "usage: test_plant REFERENCE OFF_DESIGN_REFERENCE (from the "
                        "plant_reference example, without and with `off-design`)\n");
        return 2;
    }
    demo_plant_bit_for_bit();
    reference_used_up();
    if (!(reference = fopen(argv[2], "r"))) {
        fprintf(stderr, "cannot open %s\n", argv[2]);
        return 2;
    }
    losses_and_off_design();
    reference_used_up();
    textbook_cycle();
    components();
    heaters();
    refusals();
    printf("plant: %d checks, %d failed\n", checks, failures);
    return failures == 0 ? 0 : 1;
}
