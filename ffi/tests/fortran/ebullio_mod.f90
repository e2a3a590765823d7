! Fortran 2003 interface to the ebullio C ABI through ISO_C_BINDING.
! The numbers are those of ffi/include/ebullio.h; never renumbered.
module ebullio
  use, intrinsic :: iso_c_binding, only: c_int32_t, c_double, c_size_t, c_ptr, c_char
  implicit none
  private

  ! EbullioStatus
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_OK = 0
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_NULL_POINTER = 100
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_UNKNOWN_INPUT_PAIR = 101
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_UNKNOWN_UNITS = 102
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_UNKNOWN_METHOD = 103
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_UNKNOWN_PROPERTY = 104
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_BAD_LENGTH = 105
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_BAD_STRUCT_SIZE = 106
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_UNKNOWN_VARIABLE = 107
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_UNKNOWN_PLANT_CODE = 108
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_UNKNOWN_MEASURED_CODE = 109
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_NOT_FINITE = 200
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_OUT_OF_RANGE = 201
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_QUALITY_OUT_OF_RANGE = 202
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_NO_STATE_IN_RANGE = 203
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_BACKWARD_EQUATION_OUT_OF_RANGE = 204
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_PROPERTY_UNDEFINED = 205
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_INVALID_PLANT = 206
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_NOT_FIXED_BY_MEASUREMENT = 207
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_NOT_CONVERGED = 300
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_SOME_ELEMENTS_FAILED = 400
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_PANIC = 900
  integer(c_int32_t), parameter, public :: EBULLIO_STATUS_UNKNOWN_ERROR = 901

  ! EbullioUnits, EbullioMethod
  integer(c_int32_t), parameter, public :: EBULLIO_UNITS_NATIVE = 0
  integer(c_int32_t), parameter, public :: EBULLIO_UNITS_SI_BASE = 1
  integer(c_int32_t), parameter, public :: EBULLIO_UNITS_METRIC_ENGINEERING = 2
  integer(c_int32_t), parameter, public :: EBULLIO_UNITS_US_CUSTOMARY = 3
  integer(c_int32_t), parameter, public :: EBULLIO_METHOD_EXACT = 0
  integer(c_int32_t), parameter, public :: EBULLIO_METHOD_BACKWARD_ONLY = 1

  ! EbullioInputPair
  integer(c_int32_t), parameter, public :: EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE = 1
  integer(c_int32_t), parameter, public :: EBULLIO_INPUT_PAIR_PRESSURE_ENTHALPY = 2
  integer(c_int32_t), parameter, public :: EBULLIO_INPUT_PAIR_PRESSURE_ENTROPY = 3
  integer(c_int32_t), parameter, public :: EBULLIO_INPUT_PAIR_ENTHALPY_ENTROPY = 4
  integer(c_int32_t), parameter, public :: EBULLIO_INPUT_PAIR_DENSITY_TEMPERATURE = 5
  integer(c_int32_t), parameter, public :: EBULLIO_INPUT_PAIR_VOLUME_TEMPERATURE = 6
  integer(c_int32_t), parameter, public :: EBULLIO_INPUT_PAIR_VOLUME_INTERNAL_ENERGY = 7
  integer(c_int32_t), parameter, public :: EBULLIO_INPUT_PAIR_PRESSURE_QUALITY = 8
  integer(c_int32_t), parameter, public :: EBULLIO_INPUT_PAIR_TEMPERATURE_QUALITY = 9

  ! EbullioProperty
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_PRESSURE = 1
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_TEMPERATURE = 2
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_SPECIFIC_VOLUME = 3
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_DENSITY = 4
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_INTERNAL_ENERGY = 5
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_ENTHALPY = 6
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_ENTROPY = 7
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_ISOBARIC_HEAT_CAPACITY = 8
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_ISOCHORIC_HEAT_CAPACITY = 9
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_SPEED_OF_SOUND = 10
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_QUALITY = 11
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_EXPANSION_COEFFICIENT = 12
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_COMPRESSIBILITY = 13
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_GIBBS_ENERGY = 14
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_HELMHOLTZ_ENERGY = 15
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_VISCOSITY = 16
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_THERMAL_CONDUCTIVITY = 17
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_KINEMATIC_VISCOSITY = 18
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_THERMAL_DIFFUSIVITY = 19
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_PRANDTL_NUMBER = 20
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_SURFACE_TENSION = 21
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_ISENTROPIC_EXPONENT = 22
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_JOULE_THOMSON_COEFFICIENT = 23
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_ISOTHERMAL_THROTTLING_COEFFICIENT = 24
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_RELATIVE_PRESSURE_COEFFICIENT = 25
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_ISOTHERMAL_STRESS_COEFFICIENT = 26
  integer(c_int32_t), parameter, public :: EBULLIO_PROPERTY_NEAR_SATURATION = 27

  ! EbullioVariable (of a derivative (dz/dx)_y)
  integer(c_int32_t), parameter, public :: EBULLIO_VARIABLE_PRESSURE = 1
  integer(c_int32_t), parameter, public :: EBULLIO_VARIABLE_TEMPERATURE = 2
  integer(c_int32_t), parameter, public :: EBULLIO_VARIABLE_SPECIFIC_VOLUME = 3
  integer(c_int32_t), parameter, public :: EBULLIO_VARIABLE_DENSITY = 4
  integer(c_int32_t), parameter, public :: EBULLIO_VARIABLE_INTERNAL_ENERGY = 5
  integer(c_int32_t), parameter, public :: EBULLIO_VARIABLE_ENTHALPY = 6
  integer(c_int32_t), parameter, public :: EBULLIO_VARIABLE_ENTROPY = 7
  integer(c_int32_t), parameter, public :: EBULLIO_VARIABLE_GIBBS_ENERGY = 8
  integer(c_int32_t), parameter, public :: EBULLIO_VARIABLE_HELMHOLTZ_ENERGY = 9

  ! EbullioState, version 1 (136 bytes). Set size = c_sizeof(state) first.
  type, bind(c), public :: ebullio_state
    integer(c_int32_t) :: size = 0
    integer(c_int32_t) :: units = 0
    integer(c_int32_t) :: region = 0
    integer(c_int32_t) :: phase = 0
    real(c_double) :: pressure, temperature, specific_volume, density
    real(c_double) :: internal_energy, enthalpy, entropy
    real(c_double) :: isobaric_heat_capacity, isochoric_heat_capacity, speed_of_sound
    real(c_double) :: quality, expansion_coefficient, compressibility
    real(c_double) :: gibbs_energy, helmholtz_energy
  end type ebullio_state

  ! The C enums are 32-bit; Fortran passes them as integer(c_int32_t) by value
  ! (unsigned in C, the same bits for every value the header defines).
  interface
    function ebullio_abi_version() bind(c, name="ebullio_abi_version") result(v)
      import :: c_int32_t
      integer(c_int32_t) :: v
    end function

    function ebullio_property(property, pair, a, b, units, method, status) &
        bind(c, name="ebullio_property") result(v)
      import :: c_int32_t, c_double
      integer(c_int32_t), value :: property, pair, units, method
      real(c_double), value :: a, b
      integer(c_int32_t), intent(out) :: status
      real(c_double) :: v
    end function

    function ebullio_derivative(z, x, y, pair, a, b, units, method, status) &
        bind(c, name="ebullio_derivative") result(v)
      import :: c_int32_t, c_double
      integer(c_int32_t), value :: z, x, y, pair, units, method
      real(c_double), value :: a, b
      integer(c_int32_t), intent(out) :: status
      real(c_double) :: v
    end function

    function ebullio_solve(pair, a, b, units, method, out, detail) &
        bind(c, name="ebullio_solve") result(status)
      import :: c_int32_t, c_double, c_ptr, ebullio_state
      integer(c_int32_t), value :: pair, units, method
      real(c_double), value :: a, b
      type(ebullio_state), intent(inout) :: out
      type(c_ptr), value :: detail
      integer(c_int32_t) :: status
    end function

    function ebullio_saturation_at_pressure(p, units, liquid, vapour, detail) &
        bind(c, name="ebullio_saturation_at_pressure") result(status)
      import :: c_int32_t, c_double, c_ptr, ebullio_state
      real(c_double), value :: p
      integer(c_int32_t), value :: units
      type(ebullio_state), intent(inout) :: liquid, vapour
      type(c_ptr), value :: detail
      integer(c_int32_t) :: status
    end function

    function ebullio_property_array(property, pair, a, b, n, units, method, out, statuses) &
        bind(c, name="ebullio_property_array") result(status)
      import :: c_int32_t, c_double, c_size_t
      integer(c_int32_t), value :: property, pair, units, method
      real(c_double), intent(in) :: a(*), b(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t), intent(out) :: statuses(*)
      integer(c_int32_t) :: status
    end function

    function ebullio_derivative_array(z, x, y, pair, a, b, n, units, method, out, statuses) &
        bind(c, name="ebullio_derivative_array") result(status)
      import :: c_int32_t, c_double, c_size_t
      integer(c_int32_t), value :: z, x, y, pair, units, method
      real(c_double), intent(in) :: a(*), b(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t), intent(out) :: statuses(*)
      integer(c_int32_t) :: status
    end function
  end interface

  public :: ebullio_abi_version, ebullio_property, ebullio_solve
  public :: ebullio_saturation_at_pressure, ebullio_property_array
  public :: ebullio_derivative, ebullio_derivative_array
end module ebullio
