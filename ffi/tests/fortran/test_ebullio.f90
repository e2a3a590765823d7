! The C ABI from Fortran: IAPWS verification values and error statuses.
program test_ebullio
  use, intrinsic :: iso_c_binding, only: c_int32_t, c_double, c_size_t, c_null_ptr, c_sizeof
  use, intrinsic :: ieee_arithmetic, only: ieee_is_nan, ieee_value, ieee_quiet_nan
  use ebullio
  implicit none
  integer :: failures = 0, checks = 0
  integer(c_int32_t) :: status, statuses(3)
  type(ebullio_state) :: s, liquid, vapour
  real(c_double) :: h, a(3), b(3), out(3)

  call check(ebullio_abi_version() == 1, "ABI version 1")

  s%size = int(c_sizeof(s), c_int32_t)
  call check(s%size == 136, "ebullio_state is 136 bytes")
  status = ebullio_solve(EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, 3.0_c_double, 300.0_c_double, &
                         EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, s, c_null_ptr)
  call check(status == EBULLIO_STATUS_OK, "solve (3 MPa, 300 K)")
  ! recalled from IAPWS R7-97(2012), Table 5, 3 MPa and 300 K
  call printed(s%specific_volume, 0.100215168e-2_c_double, 0.5e-11_c_double, "Table 5 v")
  call printed(s%enthalpy, 0.115331273e3_c_double, 0.5e-6_c_double, "Table 5 h")
  call printed(s%entropy, 0.392294792_c_double, 0.5e-9_c_double, "Table 5 s")
  call printed(s%speed_of_sound, 0.150773921e4_c_double, 0.5e-5_c_double, "Table 5 w")
  call check(s%region == 1, "region 1")

  ! recalled from IAPWS R7-97(2012), Table 15, 0.0035 MPa and 700 K
  h = ebullio_property(EBULLIO_PROPERTY_ENTHALPY, EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, &
                       0.0035_c_double, 700.0_c_double, EBULLIO_UNITS_NATIVE, &
                       EBULLIO_METHOD_EXACT, status)
  call check(status == EBULLIO_STATUS_OK, "property status")
  call printed(h, 0.333568375e4_c_double, 0.5e-5_c_double, "Table 15 h")

  ! recalled from IAPWS R7-97(2012), Table 36: Tsat(1 MPa) = 0.453035632e3 K
  liquid%size = int(c_sizeof(liquid), c_int32_t)
  vapour%size = int(c_sizeof(vapour), c_int32_t)
  status = ebullio_saturation_at_pressure(1.0_c_double, EBULLIO_UNITS_NATIVE, liquid, vapour, &
                                          c_null_ptr)
  call check(status == EBULLIO_STATUS_OK, "saturation status")
  call printed(liquid%temperature, 0.453035632e3_c_double, 0.5e-6_c_double, "Table 36 Tsat")
  call check(abs(vapour%quality - 1.0_c_double) < 1e-300_c_double, "vapour quality 1")

  ! An array with a bad reading in the middle: the others still come back.
  a = [3.0_c_double, 200.0_c_double, 80.0_c_double]
  b = [300.0_c_double, 300.0_c_double, 300.0_c_double]
  status = ebullio_property_array(EBULLIO_PROPERTY_ENTHALPY, &
                                  EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, a, b, &
                                  3_c_size_t, EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, &
                                  out, statuses)
  call check(status == EBULLIO_STATUS_SOME_ELEMENTS_FAILED, "array status")
  call check(statuses(2) == EBULLIO_STATUS_OUT_OF_RANGE, "element 2 out of range")
  call check(ieee_is_nan(out(2)), "element 2 NaN")
  ! recalled from IAPWS R7-97(2012), Table 5, 80 MPa and 300 K
  call printed(out(3), 0.184142828e3_c_double, 0.5e-6_c_double, "Table 5 h (80 MPa)")

  ! recalled from IAPWS R12-08, Table 4: viscosity 889.735100 uPa s at
  ! 298.15 K and 998 kg/m3, the state given by (rho, T)
  h = ebullio_property(EBULLIO_PROPERTY_VISCOSITY, EBULLIO_INPUT_PAIR_DENSITY_TEMPERATURE, &
                       998.0_c_double, 298.15_c_double, EBULLIO_UNITS_NATIVE, &
                       EBULLIO_METHOD_EXACT, status)
  call check(status == EBULLIO_STATUS_OK, "viscosity status")
  call printed(h * 1e6_c_double, 889.735100_c_double, 0.5e-6_c_double, "R12-08 Table 4 mu")
  ! Wet steam has no viscosity as a mixture.
  h = ebullio_property(EBULLIO_PROPERTY_VISCOSITY, EBULLIO_INPUT_PAIR_PRESSURE_QUALITY, &
                       0.1_c_double, 0.5_c_double, EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, status)
  call check(status == EBULLIO_STATUS_PROPERTY_UNDEFINED .and. ieee_is_nan(h), "wet viscosity")

  ! recalled from IAPWS R7-97(2012), Table 15, 0.0035 MPa and 700 K:
  ! cp = 0.208141274e1 kJ/(kg K) as the derivative (dh/dT)_p
  h = ebullio_derivative(EBULLIO_VARIABLE_ENTHALPY, EBULLIO_VARIABLE_TEMPERATURE, &
                         EBULLIO_VARIABLE_PRESSURE, EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, &
                         0.0035_c_double, 700.0_c_double, EBULLIO_UNITS_NATIVE, &
                         EBULLIO_METHOD_EXACT, status)
  call check(status == EBULLIO_STATUS_OK, "derivative status")
  call printed(h, 0.208141274e1_c_double, 0.5e-8_c_double, "Table 15 cp = (dh/dT)_p")
  h = ebullio_derivative(EBULLIO_VARIABLE_ENTHALPY, EBULLIO_VARIABLE_TEMPERATURE, 0_c_int32_t, &
                         EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, 0.0035_c_double, &
                         700.0_c_double, EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, status)
  call check(status == EBULLIO_STATUS_UNKNOWN_VARIABLE .and. ieee_is_nan(h), "unknown variable")
  ! The same cp for a batch with an out-of-range reading in the middle;
  ! recalled from IAPWS R7-97(2012), Table 15: cp(30 MPa, 700 K) = 0.103505092e2
  a = [0.0035_c_double, 200.0_c_double, 30.0_c_double]
  b = [700.0_c_double, 700.0_c_double, 700.0_c_double]
  status = ebullio_derivative_array(EBULLIO_VARIABLE_ENTHALPY, EBULLIO_VARIABLE_TEMPERATURE, &
                                    EBULLIO_VARIABLE_PRESSURE, &
                                    EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, a, b, 3_c_size_t, &
                                    EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, out, statuses)
  call check(status == EBULLIO_STATUS_SOME_ELEMENTS_FAILED, "derivative array status")
  call check(statuses(2) == EBULLIO_STATUS_OUT_OF_RANGE .and. ieee_is_nan(out(2)), &
             "derivative element 2")
  call printed(out(1), 0.208141274e1_c_double, 0.5e-8_c_double, "array cp (0.0035 MPa)")
  call printed(out(3), 0.103505092e2_c_double, 0.5e-7_c_double, "array cp (30 MPa)")

  ! Error statuses.
  h = ebullio_property(EBULLIO_PROPERTY_ENTHALPY, 42_c_int32_t, 3.0_c_double, &
                       300.0_c_double, EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, status)
  call check(status == EBULLIO_STATUS_UNKNOWN_INPUT_PAIR .and. ieee_is_nan(h), "bad pair")
  h = ebullio_property(EBULLIO_PROPERTY_ENTHALPY, EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, &
                       ieee_value(h, ieee_quiet_nan), 300.0_c_double, EBULLIO_UNITS_NATIVE, &
                       EBULLIO_METHOD_EXACT, status)
  call check(status == EBULLIO_STATUS_NOT_FINITE, "NaN input")
  s%size = 4
  status = ebullio_solve(EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, 3.0_c_double, 300.0_c_double, &
                         EBULLIO_UNITS_NATIVE, EBULLIO_METHOD_EXACT, s, c_null_ptr)
  call check(status == EBULLIO_STATUS_BAD_STRUCT_SIZE, "struct size too small")

  print '(a, i0, a, i0, a)', "fortran: ", checks, " checks, ", failures, " failed"
  if (failures /= 0) error stop 1

contains

  subroutine check(ok, what)
    logical, intent(in) :: ok
    character(*), intent(in) :: what
    checks = checks + 1
    if (.not. ok) then
      failures = failures + 1
      print '(a, a)', "check failed: ", what
    end if
  end subroutine

  ! Agreement to half a unit in the last printed place.
  subroutine printed(actual, expected, half_unit, what)
    real(c_double), intent(in) :: actual, expected, half_unit
    character(*), intent(in) :: what
    call check(abs(actual - expected) <= half_unit * (1.0_c_double + 1e-9_c_double), what)
    if (abs(actual - expected) > half_unit) print '(a, es20.12)', "  computed ", actual
  end subroutine
end program test_ebullio
