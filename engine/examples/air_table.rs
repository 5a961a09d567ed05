//! Prints, as JSON, Spinfoil's air over a grid of altitude, temperature offset, measured
//! pressure and temperature, and relative humidity, for the Python reference checks
//! (`tests/test_air_reference.py`).
//!
//! Output: `{"standard": [row...], "measured": [row...]}`; each row holds the inputs and the
//! resulting temperature (K), pressure (Pa), density (kg/m³), viscosity (Pa·s), saturation and
//! partial vapour pressures (Pa).
use serde_json::{json, Value};
use spinfoil_engine::AirSpec;

const ALTITUDES_M: [f64; 8] = [0.0, 500.0, 1000.0, 1500.0, 2000.0, 2500.0, 3000.0, 15_000.0];
const OFFSETS_K: [f64; 5] = [-20.0, -10.0, 0.0, 10.0, 20.0];
const HUMIDITIES_PCT: [f64; 5] = [0.0, 25.0, 50.0, 75.0, 100.0];
const PRESSURES_PA: [f64; 3] = [70_000.0, 85_000.0, 101_325.0];
const TEMPERATURES_C: [f64; 6] = [-10.0, 0.0, 10.0, 20.0, 35.0, 45.0];

fn main() {
    let table = json!({ "standard": standard_rows(), "measured": measured_rows() });
    println!("{table}");
}

fn standard_rows() -> Vec<Value> {
    let mut rows = Vec::new();
    for altitude_m in ALTITUDES_M {
        for offset_k in OFFSETS_K {
            for humidity_pct in HUMIDITIES_PCT {
                let spec = AirSpec::standard_with_offset(altitude_m, offset_k)
                    .with_relative_humidity_pct(humidity_pct);
                rows.push(row(&spec));
            }
        }
    }
    rows
}

fn measured_rows() -> Vec<Value> {
    let mut rows = Vec::new();
    for pressure_pa in PRESSURES_PA {
        for temperature_c in TEMPERATURES_C {
            for humidity_pct in HUMIDITIES_PCT {
                for enhancement in [false, true] {
                    let spec = AirSpec::measured(pressure_pa, temperature_c + 273.15)
                        .with_relative_humidity_pct(humidity_pct)
                        .with_enhancement_factor(enhancement);
                    rows.push(row(&spec));
                }
            }
        }
    }
    rows
}

fn row(spec: &AirSpec) -> Value {
    let air = match spec.build_detailed() {
        Ok(air) => air,
        Err(error) => panic!("grid point {spec:?} is invalid: {error}"),
    };
    let mut value = serde_json::to_value(spec).unwrap_or(Value::Null);
    value["temperature_k"] = json!(air.properties.temperature_k);
    value["pressure_pa"] = json!(air.properties.pressure_pa);
    value["density_kg_m3"] = json!(air.properties.density_kg_m3);
    value["viscosity_pa_s"] = json!(air.properties.dynamic_viscosity_pa_s);
    value["saturation_vapour_pressure_pa"] = json!(air.saturation_vapour_pressure_pa);
    value["vapour_pressure_pa"] = json!(air.vapour_pressure_pa);
    value
}
