Attribute VB_Name = "EbullioWorksheet"
' Worksheet functions over the ebullio C ABI, for a 64-bit spreadsheet host
' with a VBA-style macro language. Put libebullio_c's Windows build
' (ebullio_c.dll) on the DLL search path or give its full path in the Declare
' lines below.
'
' NOT BUILT OR TESTED HERE: the project is built and tested on Linux x86-64
' only. The same foreign-function call (by path, by value, status by
' reference) is exercised on Linux by ffi/tests/python/test_ctypes.py.
'
' In a cell:   =SteamProperty(6, 1, 30, 540)          h at 30 bar, 540 degC
'              =EnthalpyAtPressureAndTemperature(167, 538, 2)          main steam, metric
'              =SteamMessage(1, 2000, 300, 2)         why a state fails
'              =SteamProperty(20, 1, 1, 40)           Prandtl number of condensate
'              =SteamDerivative(4, 1, 6, 2, 5, 2500)  (drho/dp)_h of wet steam
Option Explicit

' Enum numbers from ffi/include/ebullio.h; never renumbered.
Public Const EBULLIO_UNITS_NATIVE As Long = 0
Public Const EBULLIO_UNITS_SI_BASE As Long = 1
Public Const EBULLIO_UNITS_METRIC_ENGINEERING As Long = 2
Public Const EBULLIO_UNITS_US_CUSTOMARY As Long = 3

Public Const EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE As Long = 1
Public Const EBULLIO_INPUT_PAIR_PRESSURE_ENTHALPY As Long = 2
Public Const EBULLIO_INPUT_PAIR_PRESSURE_ENTROPY As Long = 3
Public Const EBULLIO_INPUT_PAIR_ENTHALPY_ENTROPY As Long = 4
Public Const EBULLIO_INPUT_PAIR_PRESSURE_QUALITY As Long = 8
Public Const EBULLIO_INPUT_PAIR_TEMPERATURE_QUALITY As Long = 9

Public Const EBULLIO_PROPERTY_TEMPERATURE As Long = 2
Public Const EBULLIO_PROPERTY_ENTHALPY As Long = 6
Public Const EBULLIO_PROPERTY_ENTROPY As Long = 7
Public Const EBULLIO_PROPERTY_VISCOSITY As Long = 16
Public Const EBULLIO_PROPERTY_THERMAL_CONDUCTIVITY As Long = 17
Public Const EBULLIO_PROPERTY_PRANDTL_NUMBER As Long = 20
Public Const EBULLIO_PROPERTY_SURFACE_TENSION As Long = 21

' Variables of a derivative (dz/dx)_y: p, T, v, rho, u, h, s, g, f.
Public Const EBULLIO_VARIABLE_PRESSURE As Long = 1
Public Const EBULLIO_VARIABLE_TEMPERATURE As Long = 2
Public Const EBULLIO_VARIABLE_SPECIFIC_VOLUME As Long = 3
Public Const EBULLIO_VARIABLE_DENSITY As Long = 4
Public Const EBULLIO_VARIABLE_INTERNAL_ENERGY As Long = 5
Public Const EBULLIO_VARIABLE_ENTHALPY As Long = 6
Public Const EBULLIO_VARIABLE_ENTROPY As Long = 7
Public Const EBULLIO_VARIABLE_GIBBS_ENERGY As Long = 8
Public Const EBULLIO_VARIABLE_HELMHOLTZ_ENERGY As Long = 9

Public Const EBULLIO_METHOD_EXACT As Long = 0
Public Const EBULLIO_STATUS_OK As Long = 0

' EbullioErrorDetail, version 1: 232 bytes. LenB() gives its size.
Private Type EbullioErrorDetail
    Size As Long
    Status As Long
    Quantity As Long
    Units As Long
    Value As Double
    MinValue As Double
    MaxValue As Double
    Message(0 To 191) As Byte
End Type

' EbullioState, version 1: 136 bytes.
Private Type EbullioState
    Size As Long
    Units As Long
    Region As Long
    Phase As Long
    Values(0 To 14) As Double   ' pressure ... helmholtz_energy, in header order
End Type

' uint32_t arguments are passed as Long (the same 32 bits for every value
' the header defines); int32_t* status as ByRef Long; const char* as LongPtr.
Private Declare PtrSafe Function ebullio_property Lib "ebullio_c.dll" ( _
    ByVal property As Long, ByVal pair As Long, ByVal a As Double, ByVal b As Double, _
    ByVal units As Long, ByVal method As Long, ByRef status As Long) As Double

Private Declare PtrSafe Function ebullio_derivative Lib "ebullio_c.dll" ( _
    ByVal z As Long, ByVal x As Long, ByVal y As Long, ByVal pair As Long, _
    ByVal a As Double, ByVal b As Double, ByVal units As Long, ByVal method As Long, _
    ByRef status As Long) As Double

Private Declare PtrSafe Function ebullio_solve Lib "ebullio_c.dll" ( _
    ByVal pair As Long, ByVal a As Double, ByVal b As Double, ByVal units As Long, _
    ByVal method As Long, ByRef state As EbullioState, ByRef detail As EbullioErrorDetail) As Long

Private Declare PtrSafe Function ebullio_status_message Lib "ebullio_c.dll" ( _
    ByVal status As Long) As LongPtr

Private Declare PtrSafe Function ebullio_abi_version Lib "ebullio_c.dll" () As Long

Private Declare PtrSafe Function lstrlenA Lib "kernel32" (ByVal text As LongPtr) As Long
Private Declare PtrSafe Sub CopyMemory Lib "kernel32" Alias "RtlMoveMemory" ( _
    ByRef destination As Any, ByVal source As LongPtr, ByVal length As LongPtr)

' Any property of any state, one line: a number, or #NUM! with the reason
' left to SteamMessage.
Public Function SteamProperty(ByVal property As Long, ByVal pair As Long, ByVal a As Double, _
        ByVal b As Double, Optional ByVal units As Long = EBULLIO_UNITS_METRIC_ENGINEERING) As Variant
    Dim status As Long
    Dim value As Double
    value = ebullio_property(property, pair, a, b, units, EBULLIO_METHOD_EXACT, status)
    If status = EBULLIO_STATUS_OK Then SteamProperty = value Else SteamProperty = CVErr(xlErrNum)
End Function

' A partial derivative (dz/dx) at constant y of any state, z, x, y among
' the EBULLIO_VARIABLE_ numbers; #NUM! where it does not exist.
Public Function SteamDerivative(ByVal z As Long, ByVal x As Long, ByVal y As Long, _
        ByVal pair As Long, ByVal a As Double, ByVal b As Double, _
        Optional ByVal units As Long = EBULLIO_UNITS_METRIC_ENGINEERING) As Variant
    Dim status As Long
    Dim value As Double
    value = ebullio_derivative(z, x, y, pair, a, b, units, EBULLIO_METHOD_EXACT, status)
    If status = EBULLIO_STATUS_OK Then SteamDerivative = value Else SteamDerivative = CVErr(xlErrNum)
End Function

' Enthalpy from pressure and temperature.
Public Function EnthalpyAtPressureAndTemperature(ByVal p As Double, ByVal t As Double, _
        Optional ByVal units As Long = EBULLIO_UNITS_METRIC_ENGINEERING) As Variant
    EnthalpyAtPressureAndTemperature = SteamProperty(EBULLIO_PROPERTY_ENTHALPY, EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, p, t, units)
End Function

' Entropy from pressure and temperature.
Public Function EntropyAtPressureAndTemperature(ByVal p As Double, ByVal t As Double, _
        Optional ByVal units As Long = EBULLIO_UNITS_METRIC_ENGINEERING) As Variant
    EntropyAtPressureAndTemperature = SteamProperty(EBULLIO_PROPERTY_ENTROPY, EBULLIO_INPUT_PAIR_PRESSURE_TEMPERATURE, p, t, units)
End Function

' Temperature from pressure and enthalpy (turbine expansion, heater drains).
Public Function TemperatureAtPressureAndEnthalpy(ByVal p As Double, ByVal h As Double, _
        Optional ByVal units As Long = EBULLIO_UNITS_METRIC_ENGINEERING) As Variant
    TemperatureAtPressureAndEnthalpy = SteamProperty(EBULLIO_PROPERTY_TEMPERATURE, EBULLIO_INPUT_PAIR_PRESSURE_ENTHALPY, p, h, units)
End Function

' Saturation temperature at a pressure (quality 0 on the line).
Public Function SteamSaturationTemperature(ByVal p As Double, _
        Optional ByVal units As Long = EBULLIO_UNITS_METRIC_ENGINEERING) As Variant
    SteamSaturationTemperature = SteamProperty(EBULLIO_PROPERTY_TEMPERATURE, EBULLIO_INPUT_PAIR_PRESSURE_QUALITY, p, 0#, units)
End Function

' Why a state cannot be computed, in words, with the valid range in the
' caller's units; empty text when it can.
Public Function SteamMessage(ByVal pair As Long, ByVal a As Double, ByVal b As Double, _
        Optional ByVal units As Long = EBULLIO_UNITS_METRIC_ENGINEERING) As String
    Dim state As EbullioState
    Dim detail As EbullioErrorDetail
    Dim status As Long
    Dim n As Long
    state.Size = LenB(state)
    detail.Size = LenB(detail)
    status = ebullio_solve(pair, a, b, units, EBULLIO_METHOD_EXACT, state, detail)
    If status = EBULLIO_STATUS_OK Then
        SteamMessage = ""
        Exit Function
    End If
    n = 0
    Do While n < 191 And detail.Message(n) <> 0
        n = n + 1
    Loop
    ' The message is UTF-8 (unit symbols such as the degree sign).
    SteamMessage = Utf8ToString(detail.Message, n)
End Function

' The static text of a status code.
Public Function SteamStatusText(ByVal status As Long) As String
    Dim p As LongPtr
    Dim n As Long
    Dim bytes() As Byte
    p = ebullio_status_message(status)
    n = lstrlenA(p)
    If n = 0 Then Exit Function
    ReDim bytes(0 To n - 1)
    CopyMemory bytes(0), p, n
    SteamStatusText = Utf8ToString(bytes, n)
End Function

Private Function Utf8ToString(bytes() As Byte, ByVal n As Long) As String
    Dim i As Long
    Dim s As String
    Dim c As Long
    i = 0
    Do While i < n
        c = bytes(i)
        If c < &H80 Then
            s = s & ChrW(c): i = i + 1
        ElseIf c < &HE0 And i + 1 < n Then
            s = s & ChrW(((c And &H1F) * &H40) Or (bytes(i + 1) And &H3F)): i = i + 2
        ElseIf i + 2 < n Then
            s = s & ChrW(((c And &HF) * &H1000) Or ((bytes(i + 1) And &H3F) * &H40) Or (bytes(i + 2) And &H3F)): i = i + 3
        Else
            i = n
        End If
    Loop
    Utf8ToString = s
End Function
