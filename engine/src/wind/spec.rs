use nalgebra::Vector3;
use serde::{Deserialize, Serialize};

use super::gusts::{GustSeries, GustSpec};
use super::profile::LogProfile;
use super::{Terrain, WindField};
use crate::InputRangeError;

/// Allowed mean speed at the reference height: 0 … 40 m/s.
pub const WIND_SPEED_RANGE_MPS: (f64, f64) = (0.0, 40.0);
/// Allowed direction: −360 … 360°.
pub const WIND_FROM_RANGE_DEG: (f64, f64) = (-360.0, 360.0);
/// Allowed reference height: 0.5 … 200 m (must also exceed the roughness length).
pub const REFERENCE_HEIGHT_RANGE_M: (f64, f64) = (0.5, 200.0);
/// Allowed roughness length: 0.0001 … 2 m (calm sea to forest, Davenport–Wieringa classes).
pub const ROUGHNESS_LENGTH_RANGE_M: (f64, f64) = (1e-4, 2.0);
/// Allowed turbulence intensity: 0 … 0.5.
pub const GUST_INTENSITY_RANGE: (f64, f64) = (0.0, 0.5);
/// Allowed cross-wind to along-wind gust ratio: 0 … 1.5.
pub const GUST_LATERAL_RATIO_RANGE: (f64, f64) = (0.0, 1.5);

/// The wind of a flight, as a player or a weather report gives it.
///
/// **Direction convention.** `from_deg` is the direction the wind blows *from*, measured from
/// the downrange axis (+x) counter-clockwise seen from above, i.e. toward the thrower's left
/// (+y): 0° is a headwind (it comes from downrange and blows back at the thrower), 90° comes from
/// the left and blows to the right, 180° is a tailwind, 270° comes from the right. The air moves
/// with velocity −u(z)·(cos φ, sin φ, 0). From compass bearings use [`relative_from_deg`].
///
/// ```
/// use spinfoil_engine::{Terrain, WindField, WindSpec};
/// use nalgebra::Vector3;
/// let wind = WindSpec::new(5.0, 180.0).over(Terrain::OpenShortGrass).build().unwrap();
/// let at_10_m = wind.velocity_mps(&Vector3::new(0.0, 0.0, 10.0), 0.0);
/// assert!((at_10_m.x - 5.0).abs() < 1e-12); // a tailwind blows downrange
/// ```
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct WindSpec {
    /// Mean wind speed at the reference height, m/s (0 … 40).
    pub speed_mps: f64,
    /// Direction the wind comes from, degrees counter-clockwise from downrange (see above).
    pub from_deg: f64,
    /// Height of the speed measurement above the ground, m (default 10, the meteorological
    /// standard height).
    #[serde(default = "default_reference_height_m")]
    pub reference_height_m: f64,
    /// Surface roughness length z0, m (default 0.03, open short grass; see [`Terrain`]).
    #[serde(default = "default_roughness_length_m")]
    pub roughness_length_m: f64,
    /// Seeded gusts (default none: a steady wind).
    #[serde(default)]
    pub gusts: Option<GustSpec>,
}

fn default_reference_height_m() -> f64 {
    10.0
}

fn default_roughness_length_m() -> f64 {
    Terrain::OpenShortGrass.roughness_length_m()
}

/// Invalid wind settings.
#[derive(Debug, Clone, PartialEq, thiserror::Error)]
#[non_exhaustive]
pub enum WindError {
    /// A number is not finite or out of its allowed range.
    #[error("wind: {0}")]
    OutOfRange(#[from] InputRangeError),
    /// The reference height lies at or below the roughness length, where the profile is zero.
    #[error("wind: reference_height_m = {reference_height_m} m must exceed roughness_length_m = {roughness_length_m} m")]
    ReferenceBelowRoughness {
        /// The reference height given, m.
        reference_height_m: f64,
        /// The roughness length given, m.
        roughness_length_m: f64,
    },
}

/// The direction a wind comes from relative to downrange, in degrees counter-clockwise (our
/// `from_deg`, in 0 … 360), from compass bearings measured clockwise from north: the wind's
/// meteorological direction `wind_from_bearing_deg` and the throw's `downrange_bearing_deg`.
pub fn relative_from_deg(wind_from_bearing_deg: f64, downrange_bearing_deg: f64) -> f64 {
    (downrange_bearing_deg - wind_from_bearing_deg).rem_euclid(360.0)
}

impl WindSpec {
    /// A steady wind of `speed_mps` (m/s at 10 m) from `from_deg` (degrees, see the convention)
    /// over open short grass.
    pub fn new(speed_mps: f64, from_deg: f64) -> Self {
        let (reference_height_m, roughness_length_m) =
            (default_reference_height_m(), default_roughness_length_m());
        Self { speed_mps, from_deg, reference_height_m, roughness_length_m, gusts: None }
    }

    /// No wind.
    pub fn calm() -> Self {
        Self::new(0.0, 0.0)
    }

    /// The same wind over a preset terrain.
    pub fn over(mut self, terrain: Terrain) -> Self {
        self.roughness_length_m = terrain.roughness_length_m();
        self
    }

    /// The same wind over roughness length `roughness_length_m` (m).
    pub fn with_roughness_length_m(mut self, roughness_length_m: f64) -> Self {
        self.roughness_length_m = roughness_length_m;
        self
    }

    /// The same wind measured at `reference_height_m` (m).
    pub fn with_reference_height_m(mut self, reference_height_m: f64) -> Self {
        self.reference_height_m = reference_height_m;
        self
    }

    /// The same wind with seeded gusts.
    pub fn with_gusts(mut self, gusts: GustSpec) -> Self {
        self.gusts = Some(gusts);
        self
    }

    /// Validates the settings and builds the wind field.
    pub fn build(&self) -> Result<BoundaryLayerWind, WindError> {
        let check = InputRangeError::check_within;
        let profile = self.profile()?;
        let from_rad = check("from_deg", self.from_deg, WIND_FROM_RANGE_DEG, "°")?.to_radians();
        let toward = -Vector3::new(from_rad.cos(), from_rad.sin(), 0.0);
        let across = Vector3::new(-toward.y, toward.x, 0.0);
        let gusts = self.gusts.as_ref().map(BuiltGusts::new).transpose()?;
        Ok(BoundaryLayerWind { spec: *self, profile, toward, across, gusts })
    }

    fn profile(&self) -> Result<LogProfile, WindError> {
        let check = InputRangeError::check_within;
        let reference_speed_mps = check("speed_mps", self.speed_mps, WIND_SPEED_RANGE_MPS, "m/s")?;
        let reference_height_m =
            check("reference_height_m", self.reference_height_m, REFERENCE_HEIGHT_RANGE_M, "m")?;
        let roughness_length_m =
            check("roughness_length_m", self.roughness_length_m, ROUGHNESS_LENGTH_RANGE_M, "m")?;
        if reference_height_m <= roughness_length_m {
            return Err(WindError::ReferenceBelowRoughness { reference_height_m, roughness_length_m });
        }
        Ok(LogProfile { reference_speed_mps, reference_height_m, roughness_length_m })
    }
}

impl Default for WindSpec {
    /// No wind.
    fn default() -> Self {
        Self::calm()
    }
}

/// Gust series with their validated scales.
#[derive(Debug, Clone, PartialEq)]
struct BuiltGusts {
    along: GustSeries,
    across: GustSeries,
    intensity: f64,
    lateral_ratio: f64,
}

impl BuiltGusts {
    fn new(spec: &GustSpec) -> Result<Self, WindError> {
        let check = InputRangeError::check_within;
        let intensity = check("gusts.intensity", spec.intensity, GUST_INTENSITY_RANGE, "")?;
        let lateral_ratio = check("gusts.lateral_ratio", spec.lateral_ratio, GUST_LATERAL_RATIO_RANGE, "")?;
        let (along, across) = GustSeries::pair(spec.seed);
        Ok(Self { along, across, intensity, lateral_ratio })
    }

    /// (along-wind, cross-wind) fluctuation as fractions of the local mean speed at `time_s`.
    fn fractions(&self, time_s: f64) -> (f64, f64) {
        let along = self.intensity * self.along.value(time_s);
        (along, self.intensity * self.lateral_ratio * self.across.value(time_s))
    }
}

/// A wind over flat ground: logarithmic profile, fixed direction, optional seeded gusts.
/// Built by [`WindSpec::build`]; implements [`WindField`].
#[derive(Debug, Clone, PartialEq)]
pub struct BoundaryLayerWind {
    spec: WindSpec,
    profile: LogProfile,
    /// Unit vector the mean wind blows toward.
    toward: Vector3<f64>,
    /// Unit vector 90° counter-clockwise from `toward` (seen from above).
    across: Vector3<f64>,
    gusts: Option<BuiltGusts>,
}

impl BoundaryLayerWind {
    /// The settings it was built from.
    pub fn spec(&self) -> &WindSpec {
        &self.spec
    }

    /// Mean (gust-free) wind speed in m/s at `height_m` (m above the ground).
    pub fn mean_speed_mps(&self, height_m: f64) -> f64 {
        self.profile.speed_mps(height_m)
    }

    /// Mean (gust-free) air velocity in m/s at `height_m` (m), world frame.
    pub fn mean_velocity_mps(&self, height_m: f64) -> Vector3<f64> {
        self.toward * self.mean_speed_mps(height_m)
    }

    /// Largest possible speed in m/s at `height_m` (m), gusts included.
    pub fn peak_speed_mps(&self, height_m: f64) -> f64 {
        let Some(gusts) = &self.gusts else { return self.mean_speed_mps(height_m) };
        let along = 1.0 + gusts.intensity * gusts.along.bound();
        let across = gusts.intensity * gusts.lateral_ratio * gusts.across.bound();
        self.mean_speed_mps(height_m) * along.hypot(across)
    }
}

impl WindField for BoundaryLayerWind {
    fn velocity_mps(&self, position_m: &Vector3<f64>, time_s: f64) -> Vector3<f64> {
        let mean_mps = self.mean_speed_mps(position_m.z);
        match &self.gusts {
            None => self.toward * mean_mps,
            Some(gusts) => {
                let (along, across) = gusts.fractions(time_s);
                (self.toward * (1.0 + along) + self.across * across) * mean_mps
            }
        }
    }
}
