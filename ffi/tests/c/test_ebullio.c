/*
 * The C ABI from C99: IAPWS verification values through every call, and
 * every error path. Built by ffi/tests/run.sh with
 *   -std=c99 -Wall -Wextra -Werror -pedantic
 * once against libebullio_c.so and once against libebullio_c.a, and run under
 * valgrind. EXPECTED_VERSION and EXPECTED_ABI come from Cargo.toml.
 */
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "ebullio.h"

#ifndef EXPECTED_VERSION
#error "EXPECTED_VERSION must be defined (from Cargo.toml)"
#endif
#ifndef EXPECTED_ABI
#error "EXPECTED_ABI must be defined (from ffi/Cargo.toml)"
#endif

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

/* Half a unit in the last printed place of a literal like "0.100215168e-2". */
static double half_unit_last_place(const char *printed) {
    const char *dot = strchr(printed, '.');
    const char *e = strpbrk(printed, "eE");
    long exponent = e ? strtol(e + 1, NULL, 10) : 0;
    long decimals = 0;
    if (dot) {
        decimals = (long)((e ? e : printed + strlen(printed)) - dot - 1);
    }
    return 0.5 * pow(10.0, (double)(exponent - decimals));
}

/* The computed value agrees with the printed one to every printed digit. */
static void check_printed(const char *what, double actual, const char *printed) {
    double expected = strtod(printed, NULL);
    double allowed = half_unit_last_place(printed) * (1.0 + 1e-9) + fabs(expected) * 1e-15;
    ++checks;
    if (!(fabs(actual - expected) <= allowed)) {
        ++failures;
        fprintf(stderr, "%s: computed %.12e, printed %s\n", what, actual, printed);
    }
}

static EbullioState fresh_state(void) {
    EbullioState s;
    memset(&s, 0x5A, sizeof s);
    s.size = (uint32_t)sizeof s;
    return s;
}

static EbullioErrorDetail fresh_detail(void) {
    EbullioErrorDetail d;
    memset(&d, 0, sizeof d);
    d.size = (uint32_t)sizeof d;
    return d;
}

struct column {
    double p, t;
    const char *v, *h, *u, *s, *cp, *w;
};

static void check_column(const char *table, const struct column *c,
                         const EbullioState *st) {
    char what[128];
#define ONE(field, name)                                                   \
    sprintf(what, "%s at %g MPa, %g K: %s", table, c->p, c->t, #name);     \
    check_printed(what, st->field, c->name);
    ONE(specific_volume, v)
    ONE(enthalpy, h)
    ONE(internal_energy, u)
    ONE(entropy, s)
    ONE(isobaric_heat_capacity, cp)
    ONE(speed_of_sound, w)
#undef ONE
}

static void versions(void) {
    CHECK(ebullio_abi_version() == EBULLIO_ABI_VERSION);
    CHECK(ebullio_abi_version() == EXPECTED_ABI);
    CHECK(strcmp(ebullio_version(), EXPECTED_VERSION) == 0);
}

static void region1_table5(void) {
    /* recalled from IAPWS R7-97(2012), Table 5 */
    static const struct column cols[] = {
        {3.0, 300.0, "0.100215168e-2", "0.115331273e3", "0.112324818e3",
         "0.392294792", "0.417301218e1", "0.150773921e4"},
        {80.0, 300.0, "0.971180894e-3", "0.184142828e3", "0.106448356e3",
         "0.368563852", "0.401008987e1", "0.163469054e4"},
        {3.0, 500.0, "0.120241800e-2", "0.975542239e3", "0.971934985e3",
         "0.258041912e1", "0.465580682e1", "0.124071337e4"},
    };
    size_t i;
    for (i = 0; i < sizeof cols / sizeof cols[0]; ++i) {
        EbullioState s = fresh_state();
        CHECK_STATUS(ebullio_solve(EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                                   cols[i].p, cols[i].t, EBULLIO_UNITS_NATIVE,
                                   EBULLIO_METHOD_EXACT, &s, NULL),
                     EBULLIO_STATUS_OK);
        check_column("R7-97 Table 5", &cols[i], &s);
        CHECK(s.region == EBULLIO_REGION_ONE);
        CHECK(s.phase == EBULLIO_PHASE_COMPRESSED_LIQUID);
        CHECK(s.units == EBULLIO_UNITS_NATIVE);
        CHECK(s.size == sizeof s);
        CHECK(isnan(s.quality));
    }
    {
        /* Table 5, first column, in coherent SI: 3e6 Pa, h in J/kg. */
        EbullioStatus st = EBULLIO_STATUS_PANIC;
        double h = ebullio_property(EBULLIO_PROPERTY_ENTHALPY,
                                    EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, 3e6,
                                    300.0, EBULLIO_UNITS_SI_BASE,
                                    EBULLIO_METHOD_EXACT, &st);
        CHECK_STATUS(st, EBULLIO_STATUS_OK);
        check_printed("R7-97 Table 5 h in J/kg", h, "0.115331273e6");
    }
    {
        /* Inverse (p, h): Table 5's third column back to its temperature. */
        EbullioStatus st = EBULLIO_STATUS_PANIC;
        double t = ebullio_property(EBULLIO_PROPERTY_TEMPERATURE,
                                    EBULLIO_INPUT_PAIR_PRESSURE_ENTHALPY, 3.0,
                                    975.542239, EBULLIO_UNITS_NATIVE,
                                    EBULLIO_METHOD_EXACT, &st);
        CHECK_STATUS(st, EBULLIO_STATUS_OK);
        /* h printed to 9 digits: T comes back to about 1e-6 K. */
        CHECK(fabs(t - 500.0) < 1e-5);
    }
}

static void region2_table15(void) {
    /* recalled from IAPWS R7-97(2012), Table 15 */
    static const struct column cols[] = {
        {0.0035, 300.0, "0.394913866e2", "0.254991145e4", "0.241169160e4",
         "0.852238967e1", "0.191300162e1", "0.427920172e3"},
        {0.0035, 700.0, "0.923015898e2", "0.333568375e4", "0.301262819e4",
         "0.101749996e2", "0.208141274e1", "0.644289068e3"},
        {30.0, 700.0, "0.542946619e-2", "0.263149474e4", "0.246861076e4",
         "0.517540298e1", "0.103505092e2", "0.480386523e3"},
    };
    size_t i;
    for (i = 0; i < sizeof cols / sizeof cols[0]; ++i) {
        EbullioState s = fresh_state();
        CHECK_STATUS(ebullio_solve(EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                                   cols[i].p, cols[i].t, EBULLIO_UNITS_NATIVE,
                                   EBULLIO_METHOD_EXACT, &s, NULL),
                     EBULLIO_STATUS_OK);
        check_column("R7-97 Table 15", &cols[i], &s);
        CHECK(s.region == EBULLIO_REGION_TWO);
    }
}

static void region3_table33(void) {
    /* recalled from IAPWS R7-97(2012), Table 33: input (rho, T) */
    EbullioState s = fresh_state();
    CHECK_STATUS(ebullio_solve(EBULLIO_INPUT_PAIR_DENSITY_TEMPERATURE, 500.0,
                               650.0, EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT,
                               &s, NULL),
                 EBULLIO_STATUS_OK);
    check_printed("R7-97 Table 33 (500, 650): p", s.pressure, "0.255837018e2");
    check_printed("R7-97 Table 33 (500, 650): h", s.enthalpy, "0.186343019e4");
    check_printed("R7-97 Table 33 (500, 650): u", s.internal_energy, "0.181226279e4");
    check_printed("R7-97 Table 33 (500, 650): s", s.entropy, "0.405427273e1");
    check_printed("R7-97 Table 33 (500, 650): cp", s.isobaric_heat_capacity, "0.138935717e2");
    check_printed("R7-97 Table 33 (500, 650): w", s.speed_of_sound, "0.502005554e3");
    CHECK(s.region == EBULLIO_REGION_THREE);
    {
        EbullioStatus st = EBULLIO_STATUS_PANIC;
        double w = ebullio_property(EBULLIO_PROPERTY_SPEED_OF_SOUND,
                                    EBULLIO_INPUT_PAIR_DENSITY_TEMPERATURE, 200.0,
                                    650.0, EBULLIO_UNITS_NATIVE,
                                    EBULLIO_METHOD_EXACT, &st);
        CHECK_STATUS(st, EBULLIO_STATUS_OK);
        check_printed("R7-97 Table 33 (200, 650): w", w, "0.383444594e3");
    }
}

static void region5_table42(void) {
    /* recalled from IAPWS R7-97(2012), Table 42 (region 5 as revised in 2007) */
    static const struct column cols[] = {
        {0.5, 1500.0, "0.138455090e1", "0.521976855e4", "0.452749310e4",
         "0.965408875e1", "0.261609445e1", "0.917068690e3"},
        {30.0, 2000.0, "0.311385219e-1", "0.657122604e4", "0.563707038e4",
         "0.853640523e1", "0.288569882e1", "0.106736948e4"},
    };
    size_t i;
    for (i = 0; i < sizeof cols / sizeof cols[0]; ++i) {
        EbullioState s = fresh_state();
        CHECK_STATUS(ebullio_solve(EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                                   cols[i].p, cols[i].t, EBULLIO_UNITS_NATIVE,
                                   EBULLIO_METHOD_EXACT, &s, NULL),
                     EBULLIO_STATUS_OK);
        check_column("R7-97 Table 42", &cols[i], &s);
        CHECK(s.region == EBULLIO_REGION_FIVE);
    }
}

static void saturation_tables35_36(void) {
    EbullioState liquid = fresh_state(), vapour = fresh_state();
    EbullioStatus st = EBULLIO_STATUS_PANIC;
    double t;
    /* recalled from IAPWS R7-97(2012), Table 35: psat(300 K) */
    CHECK_STATUS(ebullio_saturation_at_temperature(300.0, EBULLIO_UNITS_NATIVE,
                                                   &liquid, &vapour, NULL),
                 EBULLIO_STATUS_OK);
    check_printed("R7-97 Table 35 psat(300 K)", liquid.pressure, "0.353658941e-2");
    CHECK(liquid.pressure == vapour.pressure);
    CHECK(liquid.phase == EBULLIO_PHASE_SATURATED_LIQUID);
    CHECK(vapour.phase == EBULLIO_PHASE_SATURATED_VAPOUR);
    CHECK(liquid.quality == 0.0 && vapour.quality == 1.0);
    /* recalled from IAPWS R7-97(2012), Table 35: psat(500 K) */
    CHECK_STATUS(ebullio_saturation_at_temperature(500.0, EBULLIO_UNITS_NATIVE,
                                                   &liquid, &vapour, NULL),
                 EBULLIO_STATUS_OK);
    check_printed("R7-97 Table 35 psat(500 K)", vapour.pressure, "0.263889776e1");
    /* recalled from IAPWS R7-97(2012), Table 36: Tsat(0.1 MPa), Tsat(1 MPa) */
    CHECK_STATUS(ebullio_saturation_at_pressure(1.0, EBULLIO_UNITS_NATIVE,
                                                &liquid, &vapour, NULL),
                 EBULLIO_STATUS_OK);
    check_printed("R7-97 Table 36 Tsat(1 MPa)", liquid.temperature, "0.453035632e3");
    t = ebullio_property(EBULLIO_PROPERTY_TEMPERATURE,
                         EBULLIO_INPUT_PAIR_PRESSURE_QUALITY, 0.1, 0.5,
                         EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_OK);
    check_printed("R7-97 Table 36 Tsat(0.1 MPa)", t, "0.372755919e3");
    /* Wet steam has no cp. */
    (void)ebullio_property(EBULLIO_PROPERTY_ISOBARIC_HEAT_CAPACITY,
                           EBULLIO_INPUT_PAIR_PRESSURE_QUALITY, 0.1, 0.5,
                           EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_PROPERTY_UNDEFINED);
}

static void arrays(void) {
    /* Table 5 and Table 15 states, with bad readings among them. */
    double p[6] = {3.0, NAN, 80.0, 200.0, 0.0035, 3.0};
    double t[6] = {300.0, 300.0, 300.0, 300.0, 300.0, 500.0};
    double h[6];
    EbullioStatus st[6];
    uint32_t props[2] = {EBULLIO_PROPERTY_ENTHALPY, EBULLIO_PROPERTY_ISOBARIC_HEAT_CAPACITY};
    double two[2 * 2];
    double px[2] = {0.1, 3.0};
    double x[2] = {0.5, 0.0};
    size_t i;

    CHECK_STATUS(ebullio_property_array(EBULLIO_PROPERTY_ENTHALPY,
                                        EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                                        p, t, 6, EBULLIO_UNITS_NATIVE,
                                        EBULLIO_METHOD_EXACT, h, st),
                 EBULLIO_STATUS_SOME_ELEMENTS_FAILED);
    /* recalled from IAPWS R7-97(2012), Tables 5 and 15 */
    check_printed("array h(3 MPa, 300 K)", h[0], "0.115331273e3");
    check_printed("array h(80 MPa, 300 K)", h[2], "0.184142828e3");
    check_printed("array h(0.0035 MPa, 300 K)", h[4], "0.254991145e4");
    check_printed("array h(3 MPa, 500 K)", h[5], "0.975542239e3");
    CHECK(isnan(h[1]) && isnan(h[3]));
    CHECK_STATUS(st[0], EBULLIO_STATUS_OK);
    CHECK_STATUS(st[1], EBULLIO_STATUS_NOT_FINITE);
    CHECK_STATUS(st[3], EBULLIO_STATUS_OUT_OF_RANGE);
    CHECK_STATUS(st[5], EBULLIO_STATUS_OK);

    /* All good, without a status array. */
    p[1] = 3.0;
    p[3] = 3.0;
    CHECK_STATUS(ebullio_property_array(EBULLIO_PROPERTY_ENTHALPY,
                                        EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                                        p, t, 6, EBULLIO_UNITS_NATIVE,
                                        EBULLIO_METHOD_EXACT, h, NULL),
                 EBULLIO_STATUS_OK);
    for (i = 0; i < 6; ++i) {
        CHECK(!isnan(h[i]));
    }
    /* In place: the output over the pressures. */
    CHECK_STATUS(ebullio_property_array(EBULLIO_PROPERTY_ENTHALPY,
                                        EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                                        p, t, 6, EBULLIO_UNITS_NATIVE,
                                        EBULLIO_METHOD_EXACT, p, NULL),
                 EBULLIO_STATUS_OK);
    CHECK(memcmp(p, h, sizeof h) == 0);

    /* Two properties per state; wet steam lacks cp: NaN, and the element
       stays OK (its state was solved). */
    CHECK_STATUS(ebullio_properties_array(props, 2,
                                          EBULLIO_INPUT_PAIR_PRESSURE_QUALITY,
                                          px, x, 2, EBULLIO_UNITS_NATIVE,
                                          EBULLIO_METHOD_EXACT, two, st),
                 EBULLIO_STATUS_OK);
    CHECK_STATUS(st[0], EBULLIO_STATUS_OK);
    CHECK_STATUS(st[1], EBULLIO_STATUS_OK);
    CHECK(!isnan(two[0]) && isnan(two[1]));
    CHECK(!isnan(two[2]) && !isnan(two[3]));

    /* An empty batch is fine, even with null pointers. */
    CHECK_STATUS(ebullio_property_array(EBULLIO_PROPERTY_ENTHALPY,
                                        EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                                        NULL, NULL, 0, EBULLIO_UNITS_NATIVE,
                                        EBULLIO_METHOD_EXACT, NULL, NULL),
                 EBULLIO_STATUS_OK);
}

/* |a - b| <= rel * |b| */
static void check_relative(const char *what, double a, double b, double rel) {
    ++checks;
    if (!(fabs(a - b) <= rel * fabs(b))) {
        ++failures;
        fprintf(stderr, "%s: %.15e vs %.15e (relative %.1e allowed)\n", what, a, b, rel);
    }
}

#define TRANSPORT_CELL(prop, pair, a_, b_, units)                          \
    ebullio_property((prop), (pair), (a_), (b_), (units), EBULLIO_METHOD_EXACT, &st)

/* (p, T) on the saturation line, read off the saturation call in US units
   and given back: the liquid side, flagged per element by property 27; ten
   kelvin (18 degF) of superheat is not flagged. At the critical point cp
   and the thermal conductivity are absent (205), not inf or NaN. */
static void near_saturation_and_critical_point(void) {
    EbullioState liquid = fresh_state(), vapour = fresh_state();
    EbullioStatus st = EBULLIO_STATUS_PANIC, sts[2];
    double p[2], t[2], flag[2], v;
    CHECK_STATUS(ebullio_saturation_at_pressure(150.0, EBULLIO_UNITS_US_CUSTOMARY,
                                                &liquid, &vapour, NULL),
                 EBULLIO_STATUS_OK);
    p[0] = p[1] = 150.0;
    t[0] = liquid.temperature;
    t[1] = liquid.temperature + 18.0;
    CHECK_STATUS(ebullio_property_array(EBULLIO_PROPERTY_NEAR_SATURATION,
                                        EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, p, t, 2,
                                        EBULLIO_UNITS_US_CUSTOMARY, EBULLIO_METHOD_EXACT,
                                        flag, sts),
                 EBULLIO_STATUS_OK);
    CHECK(flag[0] == 1.0 && flag[1] == 0.0);
    v = ebullio_property(EBULLIO_PROPERTY_ENTHALPY, EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                         150.0, liquid.temperature, EBULLIO_UNITS_US_CUSTOMARY,
                         EBULLIO_METHOD_EXACT, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_OK);
    check_relative("(p, Tsat) is the liquid side", v, liquid.enthalpy, 1e-9);
    /* IAPWS R7-97(2012), Eqs. 2 and 4: rho_c = 322 kg/m3, Tc = 647.096 K. */
    v = ebullio_property(EBULLIO_PROPERTY_ISOBARIC_HEAT_CAPACITY,
                         EBULLIO_INPUT_PAIR_DENSITY_TEMPERATURE, 322.0, 647.096,
                         EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_PROPERTY_UNDEFINED);
    CHECK(isnan(v));
    v = ebullio_property(EBULLIO_PROPERTY_THERMAL_CONDUCTIVITY,
                         EBULLIO_INPUT_PAIR_VOLUME_TEMPERATURE, 0.0031056074035673677,
                         373.94599999992187, EBULLIO_UNITS_METRIC_ENGINEERING,
                         EBULLIO_METHOD_EXACT, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_PROPERTY_UNDEFINED);
    CHECK(isnan(v));
}

static void transport(void) {
    /* recalled from IAPWS R12-08, Table 4 (T in K, rho in kg/m3, mu in
       micro-Pa s), the points inside IF97's range, each state from (rho, T). */
    static const struct {
        double t, rho;
        const char *mu;
    } table4[] = {
        {298.15, 998.0, "889.735100"}, {433.15, 1.0, "14.538324"},
        {873.15, 1.0, "32.619287"},    {873.15, 100.0, "35.802262"},
        {1173.15, 1.0, "44.217245"},
    };
    EbullioStatus st = EBULLIO_STATUS_PANIC;
    EbullioStatus sts[3];
    EbullioState s = fresh_state();
    char what[96];
    double v, mu, lambda, a_rho[3] = {998.0, 1.0, 100.0}, b_t[3] = {298.15, 1500.0, 873.15};
    double three[3 * 3];
    uint32_t props[3] = {EBULLIO_PROPERTY_VISCOSITY, EBULLIO_PROPERTY_DENSITY,
                         EBULLIO_PROPERTY_THERMAL_CONDUCTIVITY};
    size_t i;

    for (i = 0; i < sizeof table4 / sizeof table4[0]; ++i) {
        v = TRANSPORT_CELL(EBULLIO_PROPERTY_VISCOSITY, EBULLIO_INPUT_PAIR_DENSITY_TEMPERATURE,
                           table4[i].rho, table4[i].t, EBULLIO_UNITS_NATIVE);
        CHECK_STATUS(st, EBULLIO_STATUS_OK);
        sprintf(what, "R12-08 Table 4 mu(%g K, %g kg/m3) uPa s", table4[i].t, table4[i].rho);
        check_printed(what, v * 1e6, table4[i].mu);
    }
    /* recalled from IAPWS R15-11, Table 5 (without the critical enhancement):
       607.712868 mW/(m K) at 298.15 K, 998 kg/m3. The enhancement is zero
       in cold liquid (R15-11, Eq. (21); tests/tests/transport.rs), so the
       full lambda is this value. */
    v = TRANSPORT_CELL(EBULLIO_PROPERTY_THERMAL_CONDUCTIVITY,
                       EBULLIO_INPUT_PAIR_DENSITY_TEMPERATURE, 998.0, 298.15, EBULLIO_UNITS_NATIVE);
    CHECK_STATUS(st, EBULLIO_STATUS_OK);
    check_printed("R15-11 Table 5 lambda(298.15 K, 998 kg/m3) mW/(m K)", v * 1e3, "607.712868");

    /* recalled from IAPWS R1-76(2014): sigma(100 degC) = 58.91 mN/m, for the
       saturated liquid, the vapour and wet steam alike (metric: N/m). */
    for (i = 0; i < 3; ++i) {
        v = TRANSPORT_CELL(EBULLIO_PROPERTY_SURFACE_TENSION, EBULLIO_INPUT_PAIR_TEMPERATURE_QUALITY,
                           100.0, 0.5 * (double)i, EBULLIO_UNITS_METRIC_ENGINEERING);
        CHECK_STATUS(st, EBULLIO_STATUS_OK);
        check_printed("R1-76 sigma(100 degC) mN/m", v * 1e3, "58.91");
    }
    /* Off the saturation line there is no interface. */
    v = TRANSPORT_CELL(EBULLIO_PROPERTY_SURFACE_TENSION, EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                       3.0, 300.0, EBULLIO_UNITS_NATIVE);
    CHECK_STATUS(st, EBULLIO_STATUS_PROPERTY_UNDEFINED);
    CHECK(isnan(v));
    /* Wet steam has no viscosity as a mixture; its saturated liquid has. */
    v = TRANSPORT_CELL(EBULLIO_PROPERTY_VISCOSITY, EBULLIO_INPUT_PAIR_PRESSURE_QUALITY, 0.1, 0.5,
                       EBULLIO_UNITS_NATIVE);
    CHECK_STATUS(st, EBULLIO_STATUS_PROPERTY_UNDEFINED);
    CHECK(isnan(v));
    v = TRANSPORT_CELL(EBULLIO_PROPERTY_VISCOSITY, EBULLIO_INPUT_PAIR_PRESSURE_QUALITY, 0.1, 0.0,
                       EBULLIO_UNITS_NATIVE);
    CHECK_STATUS(st, EBULLIO_STATUS_OK);
    CHECK(v > 0.0);
    /* R12-08 and R15-11 end at 1173.15 K; IF97 region 5 goes further. */
    v = TRANSPORT_CELL(EBULLIO_PROPERTY_PRANDTL_NUMBER, EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                       30.0, 1500.0, EBULLIO_UNITS_NATIVE);
    CHECK_STATUS(st, EBULLIO_STATUS_OUT_OF_RANGE);
    CHECK(isnan(v));

    /* The derived quantities are their definitions, in SI: nu = mu/rho,
       a = lambda/(rho cp), Pr = mu cp/lambda (R7-97 Table 15 state). */
    CHECK_STATUS(ebullio_solve(EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, 3.5e3, 700.0,
                               EBULLIO_UNITS_SI_BASE, EBULLIO_METHOD_EXACT, &s, NULL),
                 EBULLIO_STATUS_OK);
    mu = TRANSPORT_CELL(EBULLIO_PROPERTY_VISCOSITY, EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, 3.5e3,
                        700.0, EBULLIO_UNITS_SI_BASE);
    lambda = TRANSPORT_CELL(EBULLIO_PROPERTY_THERMAL_CONDUCTIVITY,
                            EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, 3.5e3, 700.0,
                            EBULLIO_UNITS_SI_BASE);
    v = TRANSPORT_CELL(EBULLIO_PROPERTY_KINEMATIC_VISCOSITY, EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                       3.5e3, 700.0, EBULLIO_UNITS_SI_BASE);
    check_relative("nu = mu/rho", v, mu / s.density, 1e-14);
    v = TRANSPORT_CELL(EBULLIO_PROPERTY_THERMAL_DIFFUSIVITY, EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                       3.5e3, 700.0, EBULLIO_UNITS_SI_BASE);
    check_relative("a = lambda/(rho cp)", v, lambda / (s.density * s.isobaric_heat_capacity), 1e-14);
    v = TRANSPORT_CELL(EBULLIO_PROPERTY_PRANDTL_NUMBER, EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE,
                       3.5e3, 700.0, EBULLIO_UNITS_SI_BASE);
    check_relative("Pr = mu cp/lambda", v, mu * s.isobaric_heat_capacity / lambda, 1e-14);
    CHECK_STATUS(st, EBULLIO_STATUS_OK);

    /* A batch from (rho, T): good, above 1173.15 K, good. Every state is
       solved, so every element is OK; the transport properties above
       1173.15 K are NaN beside the density. */
    CHECK_STATUS(ebullio_properties_array(props, 3, EBULLIO_INPUT_PAIR_DENSITY_TEMPERATURE, a_rho,
                                          b_t, 3, EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT,
                                          three, sts),
                 EBULLIO_STATUS_OK);
    CHECK_STATUS(sts[0], EBULLIO_STATUS_OK);
    CHECK_STATUS(sts[1], EBULLIO_STATUS_OK);
    CHECK_STATUS(sts[2], EBULLIO_STATUS_OK);
    check_printed("batch R12-08 Table 4 mu(298.15 K, 998) uPa s", three[0] * 1e6, "889.735100");
    check_printed("batch R15-11 Table 5 lambda(298.15 K, 998) mW/(m K)", three[2] * 1e3,
                  "607.712868");
    CHECK(isnan(three[3]) && isnan(three[5]) && fabs(three[4] - 1.0) < 1e-9);
    check_printed("batch R12-08 Table 4 mu(873.15 K, 100) uPa s", three[6] * 1e6, "35.802262");
    CHECK_STATUS(ebullio_property_array(EBULLIO_PROPERTY_VISCOSITY,
                                        EBULLIO_INPUT_PAIR_DENSITY_TEMPERATURE, a_rho, b_t, 3,
                                        EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, a_rho, sts),
                 EBULLIO_STATUS_SOME_ELEMENTS_FAILED);
    CHECK(a_rho[0] == three[0] && isnan(a_rho[1]) && a_rho[2] == three[6]);
}

#define D(z, x, y, pair, a_, b_, units)                                    \
    ebullio_derivative(EBULLIO_VARIABLE_##z, EBULLIO_VARIABLE_##x,          \
                       EBULLIO_VARIABLE_##y, (pair), (a_), (b_), (units),   \
                       EBULLIO_METHOD_EXACT, &st)

static void derivatives(void) {
    EbullioStatus st = EBULLIO_STATUS_PANIC;
    EbullioStatus sts[3];
    EbullioState s = fresh_state();
    const uint32_t pt = EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE;
    const uint32_t si = EBULLIO_UNITS_SI_BASE;
    double v, w, hi, lo, dp;
    double p[3] = {0.0035, NAN, 30.0}, t[3] = {700.0, 700.0, 700.0};
    double one[3], two[3 * 2];
    uint32_t jacobian[2 * 3] = {EBULLIO_VARIABLE_ENTHALPY, EBULLIO_VARIABLE_TEMPERATURE,
                                EBULLIO_VARIABLE_PRESSURE, EBULLIO_VARIABLE_DENSITY,
                                EBULLIO_VARIABLE_PRESSURE, EBULLIO_VARIABLE_ENTROPY};
    uint32_t bad[3] = {EBULLIO_VARIABLE_ENTHALPY, EBULLIO_VARIABLE_PRESSURE, 10};
    size_t i;

    /* recalled from IAPWS R7-97(2012), Table 15, 0.0035 MPa and 700 K:
       cp = (dh/dT)_p and w^2 = (dp/drho)_s (native: MPa, so 1e6). */
    v = D(ENTHALPY, TEMPERATURE, PRESSURE, pt, 0.0035, 700.0, EBULLIO_UNITS_NATIVE);
    CHECK_STATUS(st, EBULLIO_STATUS_OK);
    check_printed("R7-97 Table 15 cp = (dh/dT)_p", v, "0.208141274e1");
    v = D(PRESSURE, DENSITY, ENTROPY, pt, 0.0035, 700.0, EBULLIO_UNITS_NATIVE);
    check_printed("R7-97 Table 15 w = sqrt((dp/drho)_s)", sqrt(v * 1e6), "0.644289068e3");

    /* Identities (IAPWS AN3-07), in SI, against the solved state. */
    CHECK_STATUS(ebullio_solve(pt, 3.0e7, 700.0, si, EBULLIO_METHOD_EXACT, &s, NULL),
                 EBULLIO_STATUS_OK);
    check_relative("(dg/dp)_T = v", D(GIBBS_ENERGY, PRESSURE, TEMPERATURE, pt, 3e7, 700.0, si),
                   s.specific_volume, 1e-12);
    check_relative("(dh/dT)_p = cp", D(ENTHALPY, TEMPERATURE, PRESSURE, pt, 3e7, 700.0, si),
                   s.isobaric_heat_capacity, 1e-12);
    check_relative("(du/dT)_v = cv", D(INTERNAL_ENERGY, TEMPERATURE, SPECIFIC_VOLUME, pt, 3e7, 700.0, si),
                   s.isochoric_heat_capacity, 1e-9);
    check_relative("Maxwell (ds/dp)_T = -(dv/dT)_p",
                   D(ENTROPY, PRESSURE, TEMPERATURE, pt, 3e7, 700.0, si),
                   -D(SPECIFIC_VOLUME, TEMPERATURE, PRESSURE, pt, 3e7, 700.0, si), 1e-9);
    w = s.speed_of_sound;
    v = ebullio_property(EBULLIO_PROPERTY_ISENTROPIC_EXPONENT, pt, 3e7, 700.0, si,
                         EBULLIO_METHOD_EXACT, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_OK);
    check_relative("isentropic exponent = rho w^2 / p", v, s.density * w * w / s.pressure, 1e-9);
    v = ebullio_property(EBULLIO_PROPERTY_JOULE_THOMSON_COEFFICIENT, pt, 3e7, 700.0, si,
                         EBULLIO_METHOD_EXACT, &st);
    check_relative("Joule-Thomson = v (T alpha_v - 1) / cp", v,
                   s.specific_volume * (s.temperature * s.expansion_coefficient - 1.0) /
                       s.isobaric_heat_capacity,
                   1e-9);
    v = ebullio_property(EBULLIO_PROPERTY_ISOTHERMAL_THROTTLING_COEFFICIENT, pt, 3e7, 700.0, si,
                         EBULLIO_METHOD_EXACT, &st);
    check_relative("isothermal throttling = v (1 - T alpha_v)", v,
                   s.specific_volume * (1.0 - s.temperature * s.expansion_coefficient), 1e-9);
    v = ebullio_property(EBULLIO_PROPERTY_RELATIVE_PRESSURE_COEFFICIENT, pt, 3e7, 700.0, si,
                         EBULLIO_METHOD_EXACT, &st);
    check_relative("relative pressure = alpha_v / (p kappa_T)", v,
                   s.expansion_coefficient / (s.pressure * s.compressibility), 1e-9);
    v = ebullio_property(EBULLIO_PROPERTY_ISOTHERMAL_STRESS_COEFFICIENT, pt, 3e7, 700.0, si,
                         EBULLIO_METHOD_EXACT, &st);
    check_relative("isothermal stress = 1 / (p v kappa_T)", v,
                   1.0 / (s.pressure * s.specific_volume * s.compressibility), 1e-9);
    CHECK_STATUS(st, EBULLIO_STATUS_OK);

    /* Wet steam: (drho/dp)_h, homogeneous, against a central difference of
       densities from (p, h); (dh/dp)_T does not exist (T is fixed by p). */
    v = D(DENSITY, PRESSURE, ENTHALPY, EBULLIO_INPUT_PAIR_PRESSURE_QUALITY, 1e6, 0.5, si);
    CHECK_STATUS(st, EBULLIO_STATUS_OK);
    w = ebullio_property(EBULLIO_PROPERTY_ENTHALPY, EBULLIO_INPUT_PAIR_PRESSURE_QUALITY, 1e6, 0.5,
                         si, EBULLIO_METHOD_EXACT, &st);
    dp = 1.0;
    hi = ebullio_property(EBULLIO_PROPERTY_DENSITY, EBULLIO_INPUT_PAIR_PRESSURE_ENTHALPY, 1e6 + dp,
                          w, si, EBULLIO_METHOD_EXACT, &st);
    lo = ebullio_property(EBULLIO_PROPERTY_DENSITY, EBULLIO_INPUT_PAIR_PRESSURE_ENTHALPY, 1e6 - dp,
                          w, si, EBULLIO_METHOD_EXACT, &st);
    check_relative("wet (drho/dp)_h vs difference", v, (hi - lo) / (2 * dp), 1e-5);
    v = D(ENTHALPY, PRESSURE, TEMPERATURE, EBULLIO_INPUT_PAIR_PRESSURE_QUALITY, 1e6, 0.5, si);
    CHECK_STATUS(st, EBULLIO_STATUS_PROPERTY_UNDEFINED);
    CHECK(isnan(v));
    v = D(ENTHALPY, PRESSURE, PRESSURE, pt, 3e7, 700.0, si);
    CHECK_STATUS(st, EBULLIO_STATUS_PROPERTY_UNDEFINED);
    CHECK(isnan(v));

    /* Unknown variable numbers, bad enums, out of range. */
    v = ebullio_derivative(0, 1, 2, pt, 3.0, 300.0, 0, 0, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_UNKNOWN_VARIABLE);
    CHECK(isnan(v));
    v = ebullio_derivative(6, 1, 10, pt, 3.0, 300.0, 0, 0, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_UNKNOWN_VARIABLE);
    v = ebullio_derivative(6, 2, 1, 99, 3.0, 300.0, 0, 0, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_UNKNOWN_INPUT_PAIR);
    v = ebullio_derivative(6, 2, 1, pt, 300.0, 300.0, 0, 0, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_OUT_OF_RANGE);
    CHECK(isnan(v));
    v = ebullio_derivative(6, 2, 1, pt, 0.0035, 700.0, 0, 0, NULL); /* null status is allowed */
    check_printed("cp with a null status pointer", v, "0.208141274e1");

    /* Arrays: each element is the scalar call, bit for bit; a bad reading
       in the middle. */
    CHECK_STATUS(ebullio_derivative_array(EBULLIO_VARIABLE_ENTHALPY, EBULLIO_VARIABLE_TEMPERATURE,
                                          EBULLIO_VARIABLE_PRESSURE, pt, p, t, 3,
                                          EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, one, sts),
                 EBULLIO_STATUS_SOME_ELEMENTS_FAILED);
    CHECK_STATUS(sts[0], EBULLIO_STATUS_OK);
    CHECK_STATUS(sts[1], EBULLIO_STATUS_NOT_FINITE);
    CHECK_STATUS(sts[2], EBULLIO_STATUS_OK);
    /* recalled from IAPWS R7-97(2012), Table 15: cp at 0.0035 and 30 MPa, 700 K */
    check_printed("array cp(0.0035 MPa, 700 K)", one[0], "0.208141274e1");
    check_printed("array cp(30 MPa, 700 K)", one[2], "0.103505092e2");
    CHECK(isnan(one[1]));
    CHECK_STATUS(ebullio_derivatives_array(jacobian, 2, pt, p, t, 3, EBULLIO_UNITS_NATIVE,
                                           EBULLIO_METHOD_EXACT, two, NULL),
                 EBULLIO_STATUS_SOME_ELEMENTS_FAILED);
    for (i = 0; i < 3; ++i) {
        double d0 = D(ENTHALPY, TEMPERATURE, PRESSURE, pt, p[i], t[i], EBULLIO_UNITS_NATIVE);
        double d1 = D(DENSITY, PRESSURE, ENTROPY, pt, p[i], t[i], EBULLIO_UNITS_NATIVE);
        CHECK(memcmp(&two[2 * i], &d0, sizeof d0) == 0);
        CHECK(memcmp(&two[2 * i + 1], &d1, sizeof d1) == 0);
    }
    /* Argument errors write nothing. */
    one[0] = -1.0;
    sts[0] = EBULLIO_STATUS_PANIC;
    CHECK_STATUS(ebullio_derivatives_array(NULL, 1, pt, p, t, 3, 0, 0, one, sts),
                 EBULLIO_STATUS_NULL_POINTER);
    CHECK_STATUS(ebullio_derivatives_array(bad, 0, pt, p, t, 3, 0, 0, one, sts),
                 EBULLIO_STATUS_BAD_LENGTH);
    CHECK_STATUS(ebullio_derivatives_array(bad, SIZE_MAX / 2, pt, p, t, 3, 0, 0, one, sts),
                 EBULLIO_STATUS_BAD_LENGTH);
    CHECK_STATUS(ebullio_derivatives_array(bad, 1, pt, p, t, 3, 0, 0, one, sts),
                 EBULLIO_STATUS_UNKNOWN_VARIABLE);
    CHECK_STATUS(ebullio_derivative_array(6, 2, 1, pt, NULL, t, 3, 0, 0, one, sts),
                 EBULLIO_STATUS_NULL_POINTER);
    CHECK_STATUS(ebullio_derivative_array(6, 2, 1, pt, p, t, 3, 7, 0, one, sts),
                 EBULLIO_STATUS_UNKNOWN_UNITS);
    CHECK(one[0] == -1.0 && sts[0] == EBULLIO_STATUS_PANIC);
    CHECK_STATUS(ebullio_derivative_array(6, 2, 1, pt, NULL, NULL, 0, 0, 0, NULL, NULL),
                 EBULLIO_STATUS_OK);
}
#undef D
#undef TRANSPORT_CELL

static void error_paths(void) {
    EbullioState s = fresh_state(), before;
    EbullioState vapour = fresh_state();
    EbullioErrorDetail d = fresh_detail();
    EbullioStatus st = EBULLIO_STATUS_OK;
    double a[2] = {3.0, 3.0}, b[2] = {300.0, 300.0}, out[2] = {-1.0, -1.0};
    EbullioStatus sts[2] = {EBULLIO_STATUS_PANIC, EBULLIO_STATUS_PANIC};
    uint32_t bad_props[2] = {EBULLIO_PROPERTY_ENTHALPY, 99};
    double v;
    before = s;

#define SOLVE(pair, a_, b_, units, method, outp, detailp)                   \
    ebullio_solve((pair), (a_), (b_), (units), (method), (outp), (detailp))

    /* Null pointers. */
    CHECK_STATUS(SOLVE(1, 3.0, 300.0, 0, 0, NULL, NULL), EBULLIO_STATUS_NULL_POINTER);
    CHECK_STATUS(SOLVE(1, 3.0, 300.0, 0, 0, NULL, &d), EBULLIO_STATUS_NULL_POINTER);
    CHECK_STATUS(d.status, EBULLIO_STATUS_NULL_POINTER);
    CHECK(strcmp(d.message, ebullio_status_message(EBULLIO_STATUS_NULL_POINTER)) == 0);
    CHECK_STATUS(ebullio_saturation_at_pressure(1.0, 0, &s, NULL, NULL),
                 EBULLIO_STATUS_NULL_POINTER);
    CHECK_STATUS(ebullio_saturation_at_temperature(400.0, 0, NULL, &vapour, NULL),
                 EBULLIO_STATUS_NULL_POINTER);
    CHECK_STATUS(ebullio_property_array(6, 1, NULL, b, 2, 0, 0, out, sts),
                 EBULLIO_STATUS_NULL_POINTER);
    CHECK_STATUS(ebullio_property_array(6, 1, a, NULL, 2, 0, 0, out, sts),
                 EBULLIO_STATUS_NULL_POINTER);
    CHECK_STATUS(ebullio_property_array(6, 1, a, b, 2, 0, 0, NULL, sts),
                 EBULLIO_STATUS_NULL_POINTER);
    CHECK_STATUS(ebullio_properties_array(NULL, 1, 1, a, b, 2, 0, 0, out, sts),
                 EBULLIO_STATUS_NULL_POINTER);
    CHECK(out[0] == -1.0 && out[1] == -1.0 && sts[0] == EBULLIO_STATUS_PANIC);
    v = ebullio_property(6, 1, 3.0, 300.0, 0, 0, NULL); /* null status is allowed */
    check_printed("h with a null status pointer", v, "0.115331273e3");

    /* Unknown enum values. */
    CHECK_STATUS(SOLVE(0, 3.0, 300.0, 0, 0, &s, NULL), EBULLIO_STATUS_UNKNOWN_INPUT_PAIR);
    CHECK_STATUS(SOLVE(10, 3.0, 300.0, 0, 0, &s, NULL), EBULLIO_STATUS_UNKNOWN_INPUT_PAIR);
    CHECK_STATUS(SOLVE(1, 3.0, 300.0, 4, 0, &s, &d), EBULLIO_STATUS_UNKNOWN_UNITS);
    CHECK_STATUS(d.status, EBULLIO_STATUS_UNKNOWN_UNITS);
    CHECK_STATUS(SOLVE(1, 3.0, 300.0, 0, 2, &s, NULL), EBULLIO_STATUS_UNKNOWN_METHOD);
    CHECK_STATUS(SOLVE(1, 3.0, 300.0, 0xFFFFFFFFu, 0, &s, NULL), EBULLIO_STATUS_UNKNOWN_UNITS);
    CHECK_STATUS(ebullio_saturation_at_pressure(1.0, 9, &s, &vapour, NULL),
                 EBULLIO_STATUS_UNKNOWN_UNITS);
    CHECK(memcmp(&s, &before, sizeof s) == 0);
    v = ebullio_property(0, 1, 3.0, 300.0, 0, 0, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_UNKNOWN_PROPERTY);
    CHECK(isnan(v));
    v = ebullio_property(28, 1, 3.0, 300.0, 0, 0, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_UNKNOWN_PROPERTY);
    v = ebullio_property(6, 77, 3.0, 300.0, 0, 0, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_UNKNOWN_INPUT_PAIR);
    CHECK(isnan(v));
    CHECK_STATUS(ebullio_property_array(99, 1, a, b, 2, 0, 0, out, sts),
                 EBULLIO_STATUS_UNKNOWN_PROPERTY);
    CHECK_STATUS(ebullio_properties_array(bad_props, 2, 1, a, b, 2, 0, 0, out, sts),
                 EBULLIO_STATUS_UNKNOWN_PROPERTY);
    CHECK_STATUS(ebullio_property_array(6, 1, a, b, 2, 5, 0, out, sts),
                 EBULLIO_STATUS_UNKNOWN_UNITS);
    CHECK(out[0] == -1.0 && out[1] == -1.0 && sts[0] == EBULLIO_STATUS_PANIC);

    /* Bad lengths and struct sizes. */
    CHECK_STATUS(ebullio_property_array(6, 1, a, b, SIZE_MAX, 0, 0, out, sts),
                 EBULLIO_STATUS_BAD_LENGTH);
    CHECK_STATUS(ebullio_properties_array(bad_props, 0, 1, a, b, 2, 0, 0, out, sts),
                 EBULLIO_STATUS_BAD_LENGTH);
    CHECK_STATUS(ebullio_properties_array(bad_props, SIZE_MAX / 2, 1, a, b, 4, 0, 0, out, sts),
                 EBULLIO_STATUS_BAD_LENGTH);
    CHECK(out[0] == -1.0 && sts[0] == EBULLIO_STATUS_PANIC);
    s.size = 8;
    CHECK_STATUS(SOLVE(1, 3.0, 300.0, 0, 0, &s, NULL), EBULLIO_STATUS_BAD_STRUCT_SIZE);
    s.size = 0;
    CHECK_STATUS(ebullio_saturation_at_pressure(1.0, 0, &s, &vapour, NULL),
                 EBULLIO_STATUS_BAD_STRUCT_SIZE);
    s.size = (uint32_t)sizeof s;
    d.size = 3;
    CHECK_STATUS(SOLVE(1, 3.0, 300.0, 0, 0, &s, &d), EBULLIO_STATUS_BAD_STRUCT_SIZE);
    d = fresh_detail();
    CHECK(memcmp(&s, &before, sizeof s) == 0);

    /* Out of range, with the detail in the caller's units:
       IAPWS R7-97(2012), section 4: p <= 100 MPa for T <= 1073.15 K. */
    CHECK_STATUS(SOLVE(1, 200.0, 300.0, EBULLIO_UNITS_NATIVE, 0, &s, &d),
                 EBULLIO_STATUS_OUT_OF_RANGE);
    CHECK(d.quantity == EBULLIO_QUANTITY_PRESSURE);
    CHECK(d.value == 200.0 && d.max == 100.0);
    CHECK(strstr(d.message, "pressure 200 MPa is outside the valid range") != NULL);
    /* 273.15 K is the lowest temperature: -5 degC is below it. */
    d = fresh_detail();
    CHECK_STATUS(SOLVE(1, 10.0, -5.0, EBULLIO_UNITS_METRIC_ENGINEERING, 0, &s, &d),
                 EBULLIO_STATUS_OUT_OF_RANGE);
    CHECK(d.quantity == EBULLIO_QUANTITY_TEMPERATURE);
    CHECK(d.units == EBULLIO_UNITS_METRIC_ENGINEERING);
    CHECK(d.value == -5.0 && fabs(d.min) < 1e-12);
    CHECK(memcmp(&s, &before, sizeof s) == 0);
    v = ebullio_property(6, 1, 200.0, 300.0, 0, 0, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_OUT_OF_RANGE);
    CHECK(isnan(v));
    CHECK_STATUS(ebullio_saturation_at_pressure(30.0, 0, &s, &vapour, &d),
                 EBULLIO_STATUS_OUT_OF_RANGE);
    CHECK(d.quantity == EBULLIO_QUANTITY_PRESSURE);

    /* NaN and infinite input. */
    d = fresh_detail();
    CHECK_STATUS(SOLVE(1, NAN, 300.0, 0, 0, &s, &d), EBULLIO_STATUS_NOT_FINITE);
    CHECK(d.quantity == EBULLIO_QUANTITY_PRESSURE && isnan(d.value));
    CHECK_STATUS(SOLVE(2, 3.0, INFINITY, 0, 0, &s, NULL), EBULLIO_STATUS_NOT_FINITE);
    v = ebullio_property(6, 1, 3.0, NAN, 0, 0, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_NOT_FINITE);
    CHECK(isnan(v));
    CHECK_STATUS(ebullio_saturation_at_temperature(NAN, 0, &s, &vapour, NULL),
                 EBULLIO_STATUS_NOT_FINITE);

    /* Quality outside [0, 1]. */
    d = fresh_detail();
    CHECK_STATUS(SOLVE(8, 1.0, 1.5, 0, 0, &s, &d), EBULLIO_STATUS_QUALITY_OUT_OF_RANGE);
    CHECK(d.quantity == EBULLIO_QUANTITY_QUALITY && d.value == 1.5 && d.max == 1.0);
    CHECK(memcmp(&s, &before, sizeof s) == 0);

    /* A successful call leaves the detail untouched. */
    d = fresh_detail();
    CHECK_STATUS(SOLVE(1, 3.0, 300.0, 0, 0, &s, &d), EBULLIO_STATUS_OK);
    CHECK(d.status == 0 && d.message[0] == '\0');
#undef SOLVE
}

static void messages(void) {
    static const int32_t codes[] = {0,   100, 101, 102, 103, 104, 105, 106, 107, 200,
                                    201, 202, 203, 204, 205, 300, 400, 900, 901};
    size_t i, j;
    for (i = 0; i < sizeof codes / sizeof codes[0]; ++i) {
        const char *m = ebullio_status_message(codes[i]);
        CHECK(m != NULL && strlen(m) > 0);
        CHECK(strcmp(m, "unknown status code") != 0);
        for (j = 0; j < i; ++j) {
            CHECK(strcmp(m, ebullio_status_message(codes[j])) != 0);
        }
    }
    CHECK(strcmp(ebullio_status_message(0), "success") == 0);
    CHECK(strcmp(ebullio_status_message(-1), "unknown status code") == 0);
    CHECK(strcmp(ebullio_status_message(12345), "unknown status code") == 0);
    CHECK(EBULLIO_STATUS_OK == 0);
}

/* The method reaches every property call (issue 12, defect 6), the
   absent-property rule (defect 13), and status 0 only with finite values
   (defects 4, 5 and 8). */
static void edges(void) {
    const uint32_t pt = EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE;
    const uint32_t strict = EBULLIO_METHOD_BACKWARD_ONLY;
    uint32_t hs[2] = {EBULLIO_PROPERTY_ENTHALPY, EBULLIO_PROPERTY_ENTROPY};
    uint32_t hx[2] = {EBULLIO_PROPERTY_ENTHALPY, EBULLIO_PROPERTY_QUALITY};
    double p = 22.06271891067149, t = 635.1878989437665, one, exact, pair[2];
    double ps[2] = {3.0, 0.0035}, ts[2] = {300.0, 700.0}, out[4];
    EbullioStatus st = EBULLIO_STATUS_PANIC, st2 = EBULLIO_STATUS_PANIC, sts[2];
    EbullioState s = fresh_state();
    EbullioHeaterBalance balance;
    EbullioErrorDetail d = fresh_detail();
    uint32_t n;
    size_t i;

    /* Region 3 beside the critical point: the strict state's enthalpy is
       the backward equation's, whichever call asks. */
    CHECK_STATUS(ebullio_solve(pt, p, t, EBULLIO_UNITS_NATIVE, strict, &s, NULL),
                 EBULLIO_STATUS_OK);
    one = ebullio_property(EBULLIO_PROPERTY_ENTHALPY, pt, p, t, EBULLIO_UNITS_NATIVE, strict, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_OK);
    CHECK(one == s.enthalpy);
    exact = ebullio_property(EBULLIO_PROPERTY_ENTHALPY, pt, p, t, EBULLIO_UNITS_NATIVE,
                             EBULLIO_METHOD_EXACT, &st);
    CHECK(fabs(one - exact) > 1e-4);
    CHECK_STATUS(ebullio_property_array(EBULLIO_PROPERTY_ENTHALPY, pt, &p, &t, 1,
                                        EBULLIO_UNITS_NATIVE, strict, &one, NULL),
                 EBULLIO_STATUS_OK);
    CHECK(one == s.enthalpy);
    CHECK_STATUS(ebullio_properties_array(hs, 2, pt, &p, &t, 1, EBULLIO_UNITS_NATIVE, strict, pair,
                                          NULL),
                 EBULLIO_STATUS_OK);
    CHECK(pair[0] == s.enthalpy && pair[1] == s.entropy);
    /* The same neighbourhood in psia and degF: enthalpy and entropy share
       the strict state's outcome. */
    (void)ebullio_property(EBULLIO_PROPERTY_ENTHALPY, pt, 3190.1416818449457, 705.102799999255,
                           EBULLIO_UNITS_US_CUSTOMARY, strict, &st);
    (void)ebullio_property(EBULLIO_PROPERTY_ENTROPY, pt, 3190.1416818449457, 705.102799999255,
                           EBULLIO_UNITS_US_CUSTOMARY, strict, &st2);
    CHECK_STATUS(st, st2);
    CHECK_STATUS(ebullio_solve(pt, 3190.1416818449457, 705.102799999255,
                               EBULLIO_UNITS_US_CUSTOMARY, strict, &s, NULL),
                 st);

    /* Quality of single-phase states: absent. One property asked: 205;
       several: NaN, the element OK. */
    (void)ebullio_property(EBULLIO_PROPERTY_QUALITY, pt, 3.0, 300.0, EBULLIO_UNITS_NATIVE,
                           EBULLIO_METHOD_EXACT, &st);
    CHECK_STATUS(st, EBULLIO_STATUS_PROPERTY_UNDEFINED);
    CHECK_STATUS(ebullio_properties_array(hx, 2, pt, ps, ts, 2, EBULLIO_UNITS_NATIVE,
                                          EBULLIO_METHOD_EXACT, out, sts),
                 EBULLIO_STATUS_OK);
    for (i = 0; i < 2; ++i) {
        CHECK_STATUS(sts[i], EBULLIO_STATUS_OK);
        CHECK(isfinite(out[2 * i]) && isnan(out[2 * i + 1]));
    }
    CHECK_STATUS(ebullio_property_array(EBULLIO_PROPERTY_QUALITY, pt, ps, ts, 2,
                                        EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, out, sts),
                 EBULLIO_STATUS_SOME_ELEMENTS_FAILED);
    CHECK_STATUS(sts[0], EBULLIO_STATUS_PROPERTY_UNDEFINED);

    /* At the critical point from (h, s) in SI units cp, alpha_v and kappa_T
       were +inf with status 0; beside it, from (v, T) in metric units, the
       thermal conductivity NaN. Every property: status 0 iff finite. */
    for (n = 1; n <= 26; ++n) {
        one = ebullio_property(n, EBULLIO_INPUT_PAIR_ENTHALPY_ENTROPY, 2087549.7609043422,
                               4412.025988194036, EBULLIO_UNITS_SI_BASE, EBULLIO_METHOD_EXACT, &st);
        CHECK((st == EBULLIO_STATUS_OK) == (isfinite(one) != 0));
        one = ebullio_property(n, EBULLIO_INPUT_PAIR_VOLUME_TEMPERATURE, 0.0031056074035673677,
                               373.94599999992187, EBULLIO_UNITS_METRIC_ENGINEERING,
                               EBULLIO_METHOD_EXACT, &st);
        CHECK((st == EBULLIO_STATUS_OK) == (isfinite(one) != 0));
    }
    CHECK_STATUS(ebullio_solve(EBULLIO_INPUT_PAIR_ENTHALPY_ENTROPY, 2087549.7609043422,
                               4412.025988194036, EBULLIO_UNITS_SI_BASE, EBULLIO_METHOD_EXACT, &s,
                               NULL),
                 EBULLIO_STATUS_OK);
    CHECK(!isinf(s.isobaric_heat_capacity) && !isinf(s.compressibility));

    /* Spray into DBL_MAX kg/h of steam: refused, nothing written. */
    memset(&balance, 0, sizeof balance);
    balance.size = (uint32_t)sizeof balance;
    balance.balancing_flow = -1.0;
    st = ebullio_attemperator_spray(167.0, 560.0, 1.7976931348623157e308, 186.0, 180.0, 538.0,
                                    EBULLIO_UNITS_METRIC_ENGINEERING, &balance, NULL, &d);
    CHECK(st != EBULLIO_STATUS_OK);
    CHECK_STATUS(d.status, st);
    CHECK(balance.balancing_flow == -1.0);
}

/* The measured-data calls on an HP section in bar and degC (an invented
 * operating point): the efficiency is the plant call's, the shares of
 * each figure's variance sum to 1, one uncertain input alone gives
 * u_c = |c| u (GUM 5.1.2), the array is the scalar call bit for bit with
 * a length-1 column broadcast, a bad element does not stop the others,
 * and the labels name the inputs. */
static void measured(void) {
    const uint32_t calc = EBULLIO_MEASURED_CALCULATION_SECTION_TEST;
    const uint32_t metric = EBULLIO_UNITS_METRIC_ENGINEERING;
    size_t n_inputs = 0, n_figures = 0, n_settings = 99;
    CHECK_STATUS(ebullio_measured_counts(calc, &n_inputs, &n_figures, &n_settings),
                 EBULLIO_STATUS_OK);
    CHECK(n_inputs == 4 && n_figures == 3 && n_settings == 0);
    char name[EBULLIO_MEASURED_NAME_CAPACITY];
    uint32_t quantity = 0;
    CHECK_STATUS(ebullio_measured_input(calc, 1, name, sizeof name, &quantity),
                 EBULLIO_STATUS_OK);
    CHECK(strcmp(name, "inlet temperature") == 0);
    CHECK(quantity == EBULLIO_QUANTITY_TEMPERATURE);
    CHECK_STATUS(ebullio_measured_figure(calc, 0, name, sizeof name, &quantity),
                 EBULLIO_STATUS_OK);
    CHECK(strcmp(name, "isentropic efficiency") == 0 && quantity == EBULLIO_QUANTITY_NONE);
    CHECK_STATUS(ebullio_measured_flag_name(EBULLIO_MEASURED_FLAG_NEAR_SATURATION, name,
                                            sizeof name),
                 EBULLIO_STATUS_OK);
    CHECK(strcmp(name, "near saturation") == 0);
    CHECK_STATUS(ebullio_measured_name(99, name, sizeof name),
                 EBULLIO_STATUS_UNKNOWN_MEASURED_CODE);

    EbullioMeasuredInput in[4] = {
        {165.0, 0.25, 0.0, 0, 0},
        {538.0, 1.0, 0.3, 1, 0},
        {40.0, 0.08, 0.0, 0, 0},
        {335.0, 1.0, 0.3, 1, 0},
    };
    EbullioMeasuredFigure fig[3];
    double sens[12], shares[12];
    uint32_t flags = 99;
    CHECK_STATUS(ebullio_measured(calc, NULL, 0, in, 4, metric, 2.0, fig, 3, sens, shares,
                                  &flags, NULL),
                 EBULLIO_STATUS_OK);
    CHECK(flags == 0);
    CHECK(fig[0].value > 0.0 && fig[0].value <= 1.0);
    CHECK(fig[0].expanded_uncertainty == 2.0 * fig[0].standard_uncertainty);
    for (int j = 0; j < 3; ++j) {
        double sum = 0.0;
        for (int k = 0; k < 4; ++k) sum += shares[j * 4 + k];
        CHECK(fabs(sum - 1.0) < 1e-12);
    }
    EbullioExpansion e = {.size = sizeof e};
    CHECK_STATUS(ebullio_section_efficiency(165.0, 538.0, 40.0, 335.0, metric, &e, NULL, NULL,
                                            NULL),
                 EBULLIO_STATUS_OK);
    CHECK(memcmp(&fig[0].value, &e.isentropic_efficiency, sizeof(double)) == 0);
    CHECK(memcmp(&fig[1].value, &e.work, sizeof(double)) == 0);

    /* Only the exhaust temperature uncertain: u_c(eta) = |d eta/d T2| u(T2). */
    EbullioMeasuredInput one[4] = {
        {165.0, 0.0, 0.0, 0, 0},
        {538.0, 0.0, 0.0, 0, 0},
        {40.0, 0.0, 0.0, 0, 0},
        {335.0, 1.5, 0.0, 0, 0},
    };
    CHECK_STATUS(ebullio_measured(calc, NULL, 0, one, 4, metric, 2.0, fig, 3, sens, shares,
                                  NULL, NULL),
                 EBULLIO_STATUS_OK);
    CHECK(fabs(fig[0].standard_uncertainty - fabs(sens[3]) * 1.5) <=
          1e-15 + 1e-12 * fig[0].standard_uncertainty);
    CHECK(shares[3] == 1.0 && shares[0] == 0.0);

    /* Columns: inlet broadcast, exhausts per element; element 1's exhaust
     * lies below saturation (Tsat(40 bar) = 250.4 degC, IAPWS R7-97),
     * element 2's is hotter than its inlet (eta < 0, flagged). */
    const double p1 = 165.0, t1 = 538.0, u_p1 = 0.25, u_t = 1.0, r_t = 0.3, u_p2 = 0.08;
    const double p2[3] = {40.0, 40.0, 40.0}, t2[3] = {335.0, 240.0, 560.0};
    EbullioMeasuredColumn cols[4] = {
        {&p1, 1, &u_p1, 1, NULL, 0, 0, 0},
        {&t1, 1, &u_t, 1, &r_t, 1, 1, 0},
        {p2, 3, &u_p2, 1, NULL, 0, 0, 0},
        {t2, 3, &u_t, 1, &r_t, 1, 1, 0},
    };
    double values[9], standard[9], expanded[9];
    uint32_t element_flags[3];
    EbullioStatus statuses[3];
    CHECK_STATUS(ebullio_measured_array(calc, NULL, 0, cols, 4, 3, metric, 2.0, values,
                                        standard, expanded, 3, NULL, NULL, element_flags,
                                        statuses),
                 EBULLIO_STATUS_SOME_ELEMENTS_FAILED);
    CHECK(statuses[0] == EBULLIO_STATUS_OK);
    CHECK(statuses[1] == EBULLIO_STATUS_NOT_FIXED_BY_MEASUREMENT);
    CHECK(statuses[2] == EBULLIO_STATUS_OK);
    CHECK(isnan(values[1]) && isnan(standard[4]) && element_flags[1] == 0);
    CHECK(element_flags[2] == EBULLIO_MEASURED_FLAG_EFFICIENCY_OUT_OF_RANGE);
    CHECK(values[2] < 0.0);
    CHECK_STATUS(ebullio_measured(calc, NULL, 0, in, 4, metric, 2.0, fig, 3, NULL, NULL, NULL,
                                  NULL),
                 EBULLIO_STATUS_OK);
    for (int j = 0; j < 3; ++j) {
        CHECK(memcmp(&values[j * 3], &fig[j].value, sizeof(double)) == 0);
        CHECK(memcmp(&standard[j * 3], &fig[j].standard_uncertainty, sizeof(double)) == 0);
        CHECK(memcmp(&expanded[j * 3], &fig[j].expanded_uncertainty, sizeof(double)) == 0);
    }

    /* Error paths: wrong count, unknown code, a shared group past 255. */
    CHECK_STATUS(ebullio_measured(calc, NULL, 0, in, 3, metric, 2.0, fig, 3, NULL, NULL, NULL,
                                  NULL),
                 EBULLIO_STATUS_BAD_LENGTH);
    CHECK_STATUS(ebullio_measured(0, NULL, 0, in, 4, metric, 2.0, fig, 3, NULL, NULL, NULL,
                                  NULL),
                 EBULLIO_STATUS_UNKNOWN_MEASURED_CODE);
    in[0].shared = 300;
    CHECK_STATUS(ebullio_measured(calc, NULL, 0, in, 4, metric, 2.0, fig, 3, NULL, NULL, NULL,
                                  NULL),
                 EBULLIO_STATUS_UNKNOWN_MEASURED_CODE);
    CHECK_STATUS(ebullio_measured(calc, NULL, 0, NULL, 4, metric, 2.0, fig, 3, NULL, NULL, NULL,
                                  NULL),
                 EBULLIO_STATUS_NULL_POINTER);
}

int main(void) {
    versions();
    region1_table5();
    region2_table15();
    region3_table33();
    region5_table42();
    saturation_tables35_36();
    near_saturation_and_critical_point();
    arrays();
    transport();
    derivatives();
    edges();
    error_paths();
    messages();
    measured();
    printf("c: %d checks, %d failed\n", checks, failures);
    return failures == 0 ? EXIT_SUCCESS : EXIT_FAILURE;
}
