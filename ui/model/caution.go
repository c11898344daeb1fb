package model

// Caution is the short caution shown with every result.
const Caution = "Preliminary sizing for scheme comparison only. Verify with a licensed structural engineer under the governing local code."

// CautionFull is the full caution shown from the menu and in the report.
const CautionFull = `Upright gives preliminary column sizes so that schemes can be compared early in design. It is not a design.

- It checks axial compression of an isolated column with idealized end conditions. It does not check applied end moments beyond the minimum moment of ACI 318-19 6.6.4.5.4, lateral loads, connections, base plates, footings, splices, vibration, deflection or construction stages.
- Loads are gravity loads from a simple takedown (ASCE 7-22 2.3.1 / 2.4.1 and 4.7); wind, seismic and special loads are not included.
- Fire: a fire-resistance rating is met by calculated methods for comparison only (steel: gypsum board enclosure, IBC 2021 722.5.1.2, or sprayed fire-resistive material, 722.5.1.3; filled tubes unprotected by 722.5.1.5 where it applies; concrete: least dimension and cover, ACI/TMS 216.1-14; timber: char, NDS 2018 Chapter 16). Listed (tested) assemblies and the local building code govern.
- Catalogue dimensions and design values were entered from published tables, and some were recalled from memory, each marked "(from memory)". Either kind may contain errors.
- Steel: AISC 360-22 Chapter E. Concrete: ACI 318-19 (strength design, simplified slenderness method). Timber: NDS 2018.

Every size must be verified and designed by a licensed structural engineer under the code that governs the project's location.`
