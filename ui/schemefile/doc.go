// Package schemefile reads and writes Upright scheme files, keeps the list
// of recently used files and autosaves the scheme being edited.
//
// # The scheme file, format version 1
//
// A scheme file is one UTF-8 JSON object of at most 1 MiB (MaxSize),
// conventionally named *.upright.json. Every field below must be present
// (null is allowed only where stated) and no other field may appear; object
// keys may come in any order but not twice. Every physical quantity is a
// string holding a number and its unit, read by ui/units, so "14 ft",
// "4.2 m", "4200 mm", "14'-6\"" and "168 in" are all lengths. Units accepted:
//
//	length    mm, cm, m, in, ft, and feet-inches such as 14'-6"
//	force     N, kN, MN, lb, kip (k), t (tonne-force)
//	pressure  Pa, kPa, kN/m2, psf, ksf
//	area      m2, ft2 (sf)
//	stress    MPa, N/mm2, psi, ksi
//	carbon    kg CO2e/kg or kg CO2e/m3 (m³), as the kind requires
//
// Dimensionless values (k, kll, rho_max, m1_m2, beta_dns) are JSON numbers;
// counts (floors, bar_grade, fire_sides) are whole JSON numbers.
// "tie" is the one field that may be absent: files written before it
// existed read with the default, 0.05 (5%); Marshal always writes it. The
// format version stays 1 for it.
//
// Where null means a default (k, kll, fy, fc, duration), only null means it:
// a value given there is checked against its range like any other, so 0 or
// "0 psi" is refused rather than read as the default.
//
//	{
//	  "format": "upright-scheme",      always this string
//	  "version": 1,                    the format version
//	  "name": "…",                     one line, at most 200 characters
//	  "units": "us" | "si",            the unit system shown
//	  "rank": "weight" | "footprint" | "carbon",
//	  "setting": {
//	    "length": "14 ft",             strong-axis unbraced length, 0.3 m to 30 m
//	    "weak_axis_length": "7 ft",    weak-axis unbraced length, at most length
//	    "ends": "pinned-pinned",       fixed-fixed, fixed-pinned, fixed-guided,
//	                                   pinned-pinned, fixed-free or pinned-guided
//	    "k": null,                     effective-length factor 0.5 to 10;
//	                                   null: the end condition's recommended value
//	    "method": "lrfd" | "asd"
//	  },
//	  "load": {
//	    "mode": "direct" | "takedown", which of the two below is used
//	    "direct": "400 kip",           typed axial load (factored for LRFD,
//	                                   service for ASD); kept when unused
//	    "takedown": {                  kept when unused; then only finite, ≥ 0
//	      "tributary_area": "900 ft2", per floor
//	      "floors": 3,                 floors carried below the roof, 0 to 100
//	      "floor_dead": "90 psf",      superimposed dead load incl. slab
//	      "floor_live": "50 psf",      unreduced
//	      "roof_dead": "30 psf",
//	      "roof_live": "20 psf",       Lr
//	      "snow": "25 psf",            S
//	      "live_reduction": true,      ASCE 7-22 4.7
//	      "kll": null,                 1, 2, 3 or 4 (ASCE 7-22 Table 4.7-1); null: 4
//	      "occupancy": "general"       general, assembly, storage or garage
//	    }
//	  },
//	  "self_weight": true,             add each column's own weight to the demand
//	  "materials": [],                 e.g. ["steel", "timber"]; [] means every
//	                                   material this build has
//	  "steel": {
//	    "families": [],                drawn from W, HP, HSS square,
//	                                   HSS rectangular, HSS round, Pipe; [] means all
//	    "fy": null                     e.g. "50 ksi"; null: each family's grade
//	  },
//	  "concrete": {
//	    "fc": null,                    e.g. "5000 psi"; null: 5,000 psi (US) or 35 MPa (SI)
//	    "bar_grade": 60,               60 or 80
//	    "rho_max": 0.04,               0.01 to 0.08
//	    "transverse": "all",           ties, spiral or all
//	    "m1_m2": -1,                   -1 to 1
//	    "beta_dns": 0.6,               0 to 1, used unless derived from the loads
//	    "beta_from_loads": true,
//	    "ei_method": "a",              a or b (ACI 318-19 6.6.4.4.4)
//	    "second_order_cap": true       hold the moment magnifier to 1.4 (ACI 318-19 6.2.5.3)
//	  },
//	  "timber": {
//	    "species": "DF-L",             sawn species code: DF-L, SP, HF or SPF
//	    "grade": "No.1",               sawn grade code: SS, No.1 or No.2
//	    "sawn": true, "glulam": true,  products included
//	    "glulam_combinations": [],     e.g. ["24F-1.8E"]; [] means all
//	    "wet": false, "incised": false, "hot": false,
//	    "fire": "none",                none, 1h, 1.5h or 2h
//	    "fire_sides": 4,               3 or 4
//	    "duration": null               permanent, ten-years, two-months, seven-days,
//	                                   ten-minutes; null: derived from the loads
//	  },
//	  "carbon": {                      every kind, A1–A3 factors
//	    "rolled-steel": "1.22 kg CO2e/kg",
//	    "hss-steel": "1.99 kg CO2e/kg",
//	    "rebar": "0.854 kg CO2e/kg",
//	    "concrete": "354 kg CO2e/m³",
//	    "sawn-timber": "63 kg CO2e/m³",
//	    "glulam": "137 kg CO2e/m³"
//	  },
//	  "tie": 0.05                      near-tie tolerance, a fraction 0 to 0.5 of
//	                                   the ranking metric; may be absent (0.05)
//	}
//
// Marshal writes each quantity in the unit of the scheme's own system (ft,
// kip, psf, ft2, ksi for US; m, kN, kPa, m2, MPa for SI) when that reads back
// to exactly the same number, and otherwise in the model's own unit (mm, N,
// kPa, m2, MPa), so that a file always reads back to exactly the scheme that
// was saved.
//
// # Versions
//
// A file whose version is higher than Version was written by a newer
// program and is refused with a message saying so; a later version of this
// package will read every older version. Files have no other version
// markers.
//
// # Errors
//
// Every refusal is an *Error naming the file, the line and column where the
// JSON places them, the field (as a dotted path such as
// "load.takedown.floor_live") and what is accepted. Range checks are those
// of model.Scheme.Validate, whose *model.FieldError is kept as Error.Err.
package schemefile
