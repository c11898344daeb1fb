// Package schemefile reads and writes Upright scheme files, keeps the list
// of recently used files and autosaves the scheme being edited.
//
// # The scheme file, format version 2
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
// existed read with the default, 0.05 (5%); Marshal always writes it. Like
// the later optional fields (concrete.nonsway_k1, fire.steel_protection,
// the sprayed-fire-protection carbon factor), it did not change the format
// version, which is 2.
//
// Where null means a default (k, kll, fy, fc, duration), only null means it:
// a value given there is checked against its range like any other, so 0 or
// "0 psi" is refused rather than read as the default.
//
//	{
//	  "format": "upright-scheme",      always this string
//	  "version": 2,                    the format version
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
//	    "method": "lrfd" | "asd",
//	    "twist_braced": false          true: the weak-axis braces also restrain
//	                                   twisting (steel Lcz = weak-axis length);
//	                                   false: Lcz is the full length
//	  },
//	  "load": {
//	    "mode": "direct" | "takedown", which of the two below is used
//	    "direct": "400 kip",           typed axial load (the governing factored
//	                                   load for LRFD, the service load for ASD);
//	                                   kept when unused
//	    "dead_share": null,            part of the typed load's service load that
//	                                   is dead, above 0 and at most 1; null: 2/3
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
//	    "ei_method": "largest",        a, b or c (ACI 318-19 6.6.4.4.4), or largest: the largest strength of the three
//	    "nonsway_k1": false,           true: k = 1.0 at nonsway ends (ACI 318-19 6.6.4.4.3); absent means false
//	    "second_order_cap": true       hold the moment magnifier to 1.4 (ACI 318-19 6.2.5.3)
//	  },
//	  "timber": {
//	    "species": "DF-L",             sawn species code: DF-L, SP, HF or SPF
//	    "grade": "No.1",               sawn grade code: SS, No.1 or No.2
//	    "sawn": true, "glulam": true,  products included
//	    "glulam_combinations": [],     names as the candidates show them, e.g.
//	                                   ["Comb. 3 DF", "Comb. 5 DF", "24F-1.8E"];
//	                                   [] means all
//	    "wet": false, "incised": false, "hot": false,
//	    "fire_sides": 4,               3 or 4 sides exposed to the rating
//	    "duration": null               permanent, ten-years, two-months, seven-days,
//	                                   ten-minutes; null: derived from the loads
//	  },
//	  "composite": {                   optional (absent: the defaults below); the
//	                                   concrete-filled HSS, wall Fy from "steel"
//	    "families": [],                drawn from Filled HSS square, Filled HSS
//	                                   rectangular, Filled HSS round; [] means all
//	    "fill_fc": null                e.g. "6 ksi", 3 to 10 ksi; null: concrete.fc
//	  },
//	  "fire": {                        optional; absent: no rating, siliceous
//	    "rating": "none",              none, 1h, 1.5h, 2h or 3h, for every
//	                                   material; absent: none
//	    "aggregate": "siliceous",      concrete aggregate for the rating:
//	                                   siliceous, carbonate or semi-lightweight;
//	                                   absent: siliceous
//	    "steel_protection": "board"    board (IBC 722.5.1.2) or spray (722.5.1.3),
//	                                   for steel and filled tubes; absent: board
//	  },
//	  "carbon": {                      every kind, A1–A3 factors
//	    "rolled-steel": "1.22 kg CO2e/kg",
//	    "hss-steel": "1.99 kg CO2e/kg",
//	    "rebar": "0.854 kg CO2e/kg",
//	    "concrete": "354 kg CO2e/m³",
//	    "sawn-timber": "63 kg CO2e/m³",
//	    "glulam": "137 kg CO2e/m³",
//	    "gypsum-board": "0.25 kg CO2e/kg",
//	    "sprayed-fire-protection": "0.4 kg CO2e/kg"  optional; absent: the default
//	  },
//	  "report_map": false,             put the map of the winning family over
//	                                   length and load in the client report;
//	                                   optional: absent reads as false
//	  "tie": 0.05                      near-tie tolerance, a fraction 0 to 0.5 of
//	                                   the ranking metric; may be absent (0.05)
//	}
//
// A top-level "variants" array may follow: up to four variants of the
// scheme, each {"name": "…", "changes": {"length": "5.5m", …}} with the
// inputs changed named as the compare flags without dashes and each value
// as that flag reads it (see variants.go). It is optional: absent means no
// variants, Marshal writes it only when there are some, and it needs no
// new format version.
//
// The "composite" object and each of its fields may be left out: a file
// written before the composite material existed reads unchanged, with every
// filled family on and the fill at the concrete f'c. Marshal always writes
// it. It needs no new format version.
//
// The optional "building" object (a whole building taken down and sized
// column by column, `upright building`) is written only for a scheme that has
// one; a file without it, or with null, has no building and reads as before:
//
//	"building": {
//	  "bays_x": ["9 m", "9 m", "9 m"],   bay spacings along x, 1 to 40, 1 m to 30 m each
//	  "bays_y": ["7.5 m", "7.5 m"],      bay spacings along y, likewise
//	  "storeys": ["4.2 m", "3.6 m"],     storey heights from the ground up, 1 to 60, 2 m to 30 m
//	  "floor_dead": "4 kPa", "floor_live": "2.4 kPa", "roof_dead": "3 kPa",
//	  "roof_live": "0 kPa", "snow": "1.5 kPa",
//	  "occupancy": "",                  as load.takedown.occupancy
//	  "live_reduction": true,
//	  "facade": "0 kN/m",               façade dead load per metre of edge at every level; absent: 0
//	  "overhang": "0 m",                slab past the outer grid lines; absent: 0
//	  "change_every": 2,                storeys a column keeps its size, 1 to 60; absent: 2
//	  "plan_family": "",                family the plan draws; "" or absent: the best
//	  "plan_storey": 0                  storey the plan shows, 1 the ground; 0 or absent: the ground
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
// markers. Two fields were added to version 1 after its first release,
// setting.twist_braced and load.dead_share: Marshal always writes them, and
// when absent on reading they take their defaults (false, and null: 2/3).
//
// Version 1 had the fire exposure inside "timber" ("fire": none, 1h, 1.5h
// or 2h) and no top-level "fire" object or "gypsum-board" factor. A
// version-1 file reads unchanged: its timber "fire" becomes the scheme's
// rating (which version 2 applies to every material), the aggregate is
// siliceous and the gypsum board factor is the default. Saving writes
// version 2.
//
// # Errors
//
// Every refusal is an *Error naming the file, the line and column where the
// JSON places them, the field (as a dotted path such as
// "load.takedown.floor_live") and what is accepted. Range checks are those
// of model.Scheme.Validate, whose *model.FieldError is kept as Error.Err.
package schemefile
