//! Environments: the air (standard atmosphere or measured, humidity) and the wind.
use super::args::{design_error, options, Fallible};
use crate::help::{FnDoc, Registrar};
use crate::options::{OptionSpec, OptionValues};
use rhai::{Map, NativeCallContext};
use serde::{Deserialize, Serialize};
use spinfoil_engine::{
    isa_temperature_k, AirProperties, AirSpec, FlightConditions, Ground, GustSpec, SurfacePreset, Terrain, WindSpec,
};
use std::sync::Arc;

/// An environment as scripts hold it: the specs (as saved) and the air they give.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub(crate) struct EnvironmentValue {
    /// The air's description.
    pub air: AirSpec,
    /// The wind's description.
    pub wind: WindSpec,
    /// The ground surface preset the disc lands on (None: the flight ends at first contact).
    #[serde(default)]
    pub ground: Option<String>,
    /// The air's properties (density, viscosity, temperature, pressure).
    #[serde(skip)]
    pub properties: Option<AirProperties>,
}

impl EnvironmentValue {
    /// Validates the specs and computes the air.
    pub fn build(air: AirSpec, wind: WindSpec) -> Result<Self, String> {
        let properties = air.build().map_err(|e| e.to_string())?;
        wind.build().map_err(|e| e.to_string())?;
        Ok(Self { air, wind, ground: None, properties: Some(properties) })
    }

    /// The air's properties (computed again for a loaded environment).
    pub fn air_properties(&self) -> AirProperties {
        self.properties.or_else(|| self.air.build().ok()).unwrap_or_else(AirProperties::sea_level_standard)
    }

    /// The flight conditions the integrator needs.
    pub fn conditions(&self) -> Result<FlightConditions, String> {
        let wind = self.wind.build().map_err(|e| e.to_string())?;
        Ok(FlightConditions { air: self.air_properties(), wind: Arc::new(wind), ..FlightConditions::default() })
    }

    /// The ground to play the landing out on, if the environment names one.
    pub fn ground(&self) -> Result<Option<Ground>, String> {
        self.ground
            .as_deref()
            .map(|name| SurfacePreset::from_name(name).map(Ground::level).map_err(|e| e.to_string()))
            .transpose()
    }

    /// Sea-level standard air (ISO 2533 at 0 m), no wind.
    pub fn standard() -> Self {
        let air = AirSpec::standard(0.0);
        Self { air, wind: WindSpec::calm(), ground: None, properties: air.build().ok() }
    }
}

const TERRAINS: &[&str] = &["open_grass", "rough_field", "wooded_edge"];

const ENVIRONMENT_OPTIONS: &[OptionSpec] = &[
    OptionSpec::optional("altitude_m", -500.0, 20_000.0, "altitude of the field in the standard atmosphere (default 0)"),
    OptionSpec::optional("pressure_hpa", 500.0, 1100.0, "measured station pressure, instead of altitude_m (needs temperature_c)"),
    OptionSpec::optional("temperature_c", -40.0, 60.0, "air temperature (default: the standard atmosphere's at the altitude)"),
    OptionSpec::optional("humidity_pct", 0.0, 100.0, "relative humidity (default 0, dry air)"),
    OptionSpec::optional("wind_mps", 0.0, 40.0, "mean wind speed at the reference height (default 0)"),
    OptionSpec::optional("wind_from_deg", -360.0, 360.0, "direction the wind comes from: 0 headwind, 90 from the left, 180 tailwind, 270 from the right (default 0)"),
    OptionSpec::optional("wind_height_m", 0.5, 200.0, "height the wind speed was measured at (default 10)"),
    OptionSpec::choice("terrain", TERRAINS, "surface roughness preset for the wind profile (default \"open_grass\")"),
    OptionSpec::optional("gust_intensity", 0.0, 0.5, "turbulence intensity σ/mean; 0 (default) is a steady wind"),
    OptionSpec::integer("gust_seed", 0, i64::MAX, "seed of the gusts (default 0); the same seed gives the same gusts"),
    OptionSpec::choice("ground", GROUNDS, "surface the disc lands on; with it, flights continue after landing (skips, slide or roll) to rest (default: none, flights end at first contact)"),
];

const GROUNDS: &[&str] = &["short_grass", "long_grass", "packed_dirt", "hard_court", "sand"];

/// Registers `environment` and the `Environment` type.
pub(crate) fn register(reg: &mut Registrar) {
    reg.section("environments", "the air a disc flies through, and the wind");
    reg.engine.register_type_with_name::<EnvironmentValue>("Environment");
    reg.engine.register_fn("environment", environment);
    reg.engine.register_fn("environment", |ctx: NativeCallContext| environment(ctx, Map::new()));
    reg.doc(FnDoc::new(
        "environment(options: map) -> Environment",
        "Air from the International Standard Atmosphere at an altitude (or measured pressure and temperature), with humidity; wind with a logarithmic profile over a terrain preset, optionally seeded gusts. Without options: sea-level standard air, no wind.",
        "let day = environment(#{ altitude_m: 420, temperature_c: 18, humidity_pct: 60, wind_mps: 3, wind_from_deg: 250 });",
    ).with_options(ENVIRONMENT_OPTIONS));
    reg.getter("Environment", "density_kg_m3", "air density, kg/m³", |e: &mut EnvironmentValue| {
        e.air_properties().density_kg_m3
    });
    reg.getter("Environment", "temperature_c", "air temperature, °C", |e: &mut EnvironmentValue| {
        e.air_properties().temperature_k - 273.15
    });
    reg.getter("Environment", "pressure_hpa", "static pressure, hPa", |e: &mut EnvironmentValue| {
        e.air_properties().pressure_pa / 100.0
    });
    reg.getter("Environment", "viscosity_pa_s", "dynamic viscosity, Pa·s", |e: &mut EnvironmentValue| {
        e.air_properties().dynamic_viscosity_pa_s
    });
    reg.getter(
        "Environment",
        "wind_mps",
        "mean wind speed at the reference height, m/s",
        |e: &mut EnvironmentValue| e.wind.speed_mps,
    );
    reg.getter("Environment", "ground", "the landing surface, or nothing", |e: &mut EnvironmentValue| {
        e.ground.clone().map_or(rhai::Dynamic::UNIT, rhai::Dynamic::from)
    });
    reg.getter(
        "Environment",
        "wind_from_deg",
        "direction the wind comes from, ° (0 headwind, 180 tailwind)",
        |e: &mut EnvironmentValue| e.wind.from_deg,
    );
    reg.text(|e: &mut EnvironmentValue| {
        let p = e.air_properties();
        let ground = e.ground.as_ref().map_or(String::new(), |g| format!("; ground {g}"));
        format!(
            "environment: air {:.4} kg/m³ at {:.1} °C, {:.1} hPa; {}{ground}",
            p.density_kg_m3,
            p.temperature_k - 273.15,
            p.pressure_pa / 100.0,
            wind_words(e.wind.speed_mps, e.wind.from_deg)
        )
    });
}

/// The wind in words: its speed, the direction it comes from and what that means for the
/// throw (`wind 5.0 m/s from 0° (headwind)`), or `no wind`.
fn wind_words(speed_mps: f64, from_deg: f64) -> String {
    if speed_mps <= 0.0 {
        return "no wind".to_string();
    }
    const SECTORS: [&str; 8] = [
        "headwind",
        "headwind from the left",
        "from the left",
        "tailwind from the left",
        "tailwind",
        "tailwind from the right",
        "from the right",
        "headwind from the right",
    ];
    let sector = ((from_deg.rem_euclid(360.0) + 22.5) / 45.0).floor() as usize % 8;
    format!("wind {speed_mps:.1} m/s from {from_deg:.0}° ({})", SECTORS[sector])
}


fn air_spec(v: &OptionValues) -> Fallible<AirSpec> {
    let spec = match (v.number("altitude_m"), v.number("pressure_hpa"), v.number("temperature_c")) {
        (Some(_), Some(_), _) => return Err(v.error("give altitude_m or pressure_hpa, not both")),
        (_, Some(_), None) => return Err(v.error("pressure_hpa needs temperature_c")),
        (_, Some(hpa), Some(c)) => AirSpec::measured(hpa * 100.0, c + 273.15),
        (altitude, None, Some(c)) => {
            let altitude_m = altitude.unwrap_or(0.0);
            AirSpec::standard_with_offset(altitude_m, c + 273.15 - isa_temperature_k(altitude_m))
        }
        (altitude, None, None) => AirSpec::standard(altitude.unwrap_or(0.0)),
    };
    Ok(spec.with_relative_humidity_pct(v.number_or("humidity_pct", 0.0)))
}

fn wind_spec(v: &OptionValues) -> WindSpec {
    let terrain = match v.text("terrain") {
        Some("rough_field") => Terrain::RoughField,
        Some("wooded_edge") => Terrain::WoodedEdge,
        _ => Terrain::OpenShortGrass,
    };
    let mut wind = WindSpec::new(v.number_or("wind_mps", 0.0), v.number_or("wind_from_deg", 0.0))
        .over(terrain)
        .with_reference_height_m(v.number_or("wind_height_m", 10.0));
    let intensity = v.number_or("gust_intensity", 0.0);
    if intensity > 0.0 {
        wind = wind.with_gusts(GustSpec { intensity, ..GustSpec::seeded(v.number_or("gust_seed", 0.0) as u64) });
    }
    wind
}

fn environment(ctx: NativeCallContext, opts: Map) -> Fallible<EnvironmentValue> {
    let v = options(&ctx, &opts, ENVIRONMENT_OPTIONS)?;
    let mut environment = EnvironmentValue::build(air_spec(&v)?, wind_spec(&v)).map_err(|e| design_error(&ctx, e))?;
    environment.ground = v.text("ground").map(str::to_string);
    Ok(environment)
}

#[cfg(test)]
mod tests {
    use super::wind_words;

    #[test]
    fn the_wind_says_where_it_comes_from() {
        assert_eq!(wind_words(5.0, 0.0), "wind 5.0 m/s from 0° (headwind)");
        assert_eq!(wind_words(3.0, 250.0), "wind 3.0 m/s from 250° (from the right)");
        assert_eq!(wind_words(3.0, -90.0), "wind 3.0 m/s from -90° (from the right)");
        assert_eq!(wind_words(2.0, 200.0), "wind 2.0 m/s from 200° (tailwind)");
        assert_eq!(wind_words(2.0, 45.0), "wind 2.0 m/s from 45° (headwind from the left)");
        assert_eq!(wind_words(0.0, 90.0), "no wind");
    }
}
