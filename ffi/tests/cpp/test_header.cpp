// The header compiled as C++11 (g++ -std=c++11 -Wall -Wextra -Werror) and
// one call through it: the extern "C" block, the typed enums and the
// struct layout C++ sees.
#include <cmath>
#include <cstddef>
#include <cstdio>
#include <cstring>
#include <type_traits>

#include "ebullio.h"

static_assert(sizeof(EbullioState) == 136, "EbullioState version 1 is 136 bytes");
static_assert(sizeof(EbullioErrorDetail) == 40 + EBULLIO_MESSAGE_CAPACITY,
              "EbullioErrorDetail version 1 layout");
static_assert(std::is_same<std::underlying_type<EbullioStatus>::type, int32_t>::value,
              "statuses are 32-bit signed");
static_assert(std::is_same<std::underlying_type<EbullioProperty>::type, uint32_t>::value,
              "properties are 32-bit unsigned");
static_assert(std::is_same<std::underlying_type<EbullioVariable>::type, uint32_t>::value,
              "variables are 32-bit unsigned");
static_assert(EBULLIO_STATUS_OK == 0, "0 is success");
// The plant blocks as the Rust side lays them out (its const asserts):
// the losses and the output begin where the version-1 structs ended.
static_assert(offsetof(EbullioCycleSpec, has_throttle_flow) == 736,
              "EbullioCycleSpec version 1 is 736 bytes");
static_assert(sizeof(EbullioCycleSpec) == 1440, "EbullioCycleSpec with the losses");
static_assert(offsetof(EbullioCycleResult, output) == 20832,
              "EbullioCycleResult version 1 is 20832 bytes");
static_assert(sizeof(EbullioPlantOutput) == 176, "EbullioPlantOutput layout");
static_assert(sizeof(EbullioCycleResult) == 20832 + 176, "EbullioCycleResult with the output");
static_assert(sizeof(EbullioOffDesignOptions) == 48 + 16 * EBULLIO_MAX_CURVE_POINTS,
              "EbullioOffDesignOptions version 1 layout");
static_assert(sizeof(EbullioOperatingPoint) == 48 + 4 * EBULLIO_MAX_HEATERS,
              "EbullioOperatingPoint version 1 layout");
static_assert(sizeof(EbullioLoadPoint) == 208, "EbullioLoadPoint layout");
static_assert(sizeof(EbullioLoadCurve) == 16 + 208 * EBULLIO_MAX_LOAD_POINTS,
              "EbullioLoadCurve version 1 layout");

int main() {
    EbullioState s;
    std::memset(&s, 0, sizeof s);
    s.size = sizeof s;
    EbullioStatus st = ebullio_solve(EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, 3.0, 300.0,
                                     EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, &s, nullptr);
    // recalled from IAPWS R7-97(2012), Table 5: h(3 MPa, 300 K) = 0.115331273e3 kJ/kg
    bool ok = st == EBULLIO_STATUS_OK && std::fabs(s.enthalpy - 115.331273) <= 5e-7 &&
              s.region == EBULLIO_REGION_ONE;
    EbullioStatus bad = EBULLIO_STATUS_OK;
    double v = ebullio_property(EBULLIO_PROPERTY_ENTHALPY, 99, 3.0, 300.0,
                                EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, &bad);
    ok = ok && bad == EBULLIO_STATUS_UNKNOWN_INPUT_PAIR && std::isnan(v);
    // recalled from IAPWS R7-97(2012), Table 5: cp(3 MPa, 300 K) = 0.417301218e1 kJ/(kg K),
    // as the derivative (dh/dT)_p through the typed variable enum.
    double cp = ebullio_derivative(EBULLIO_VARIABLE_ENTHALPY, EBULLIO_VARIABLE_TEMPERATURE,
                                   EBULLIO_VARIABLE_PRESSURE,
                                   EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, 3.0, 300.0,
                                   EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, &bad);
    ok = ok && bad == EBULLIO_STATUS_OK && std::fabs(cp - 4.17301218) <= 5e-9;
    std::printf("c++: header compiles; h = %.9g kJ/kg, %s\n", s.enthalpy, ok ? "ok" : "WRONG");
    return ok ? 0 : 1;
}
