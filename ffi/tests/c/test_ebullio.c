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

    /* Two properties per state; wet steam lacks cp. */
    CHECK_STATUS(ebullio_properties_array(props, 2,
                                          EBULLIO_INPUT_PAIR_PRESSURE_QUALITY,
                                          px, x, 2, EBULLIO_UNITS_NATIVE,
                                          EBULLIO_METHOD_EXACT, two, st),
                 EBULLIO_STATUS_SOME_ELEMENTS_FAILED);
    CHECK_STATUS(st[0], EBULLIO_STATUS_PROPERTY_UNDEFINED);
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
    v = ebullio_property(16, 1, 3.0, 300.0, 0, 0, &st);
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
    static const int32_t codes[] = {0,   100, 101, 102, 103, 104, 105, 106, 200, 201,
                                    202, 203, 204, 205, 300, 400, 900, 901};
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
    CHECK(strcmp(ebullio_status_message(107), "unknown status code") == 0);
    CHECK(EBULLIO_STATUS_OK == 0);
}

int main(void) {
    versions();
    region1_table5();
    region2_table15();
    region3_table33();
    region5_table42();
    saturation_tables35_36();
    arrays();
    error_paths();
    messages();
    printf("c: %d checks, %d failed\n", checks, failures);
    return failures == 0 ? EXIT_SUCCESS : EXIT_FAILURE;
}
