use serde::{Deserialize, Serialize};

/// What a coefficient model sees at one instant of a flight.
///
/// Axes (ours, shared by every model; published sets convert to them once, at their definition):
/// - **n**: the disc's symmetry axis, out of the top of the flight plate;
/// - **e_r** (roll axis): the air-relative velocity's component in the disc plane, normalised
///   (the "forward" direction in the disc plane);
/// - **e_p** (pitch axis): v̂ × **n**, normalised; a positive moment about it is nose-up
///   (the leading edge rises).
///
/// Rates are components of the body's angular velocity on those axes, in rad/s.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct AeroInput {
    /// Angle of attack α in rad: between the disc plane and the air-relative velocity,
    /// positive when the air strikes the underside.
    pub angle_of_attack_rad: f64,
    /// Air-relative speed V in m/s.
    pub airspeed_mps: f64,
    /// Spin rate ω_s about **n** in rad/s (signed; a right-hand backhand is negative).
    pub spin_rad_s: f64,
    /// Angular velocity about the pitch axis **e_p** in rad/s (positive nose-up).
    pub pitch_rate_rad_s: f64,
    /// Angular velocity about the roll axis **e_r** in rad/s.
    pub roll_rate_rad_s: f64,
    /// Advance ratio |ω_s|·R/V (rim speed over airspeed), dimensionless.
    pub advance_ratio: f64,
    /// Reynolds number ρVd/μ, dimensionless.
    pub reynolds_number: f64,
}

/// Dimensionless aerodynamic coefficients in our axes (see [`AeroInput`]).
///
/// Forces: lift q∞·A·`lift` along the part of **n** perpendicular to the air-relative velocity,
/// drag q∞·A·`drag` against it. Moments (reference length d, the diameter):
/// q∞·A·d·`roll` about **e_r**, q∞·A·d·`pitch` about **e_p** (positive nose-up),
/// q∞·A·d·`spin` about **n** (signed, so a damping term opposes ω_s).
#[derive(Debug, Clone, Copy, Default, PartialEq, Serialize, Deserialize)]
pub struct AeroCoefficients {
    /// Lift coefficient C_L.
    pub lift: f64,
    /// Drag coefficient C_D (never negative).
    pub drag: f64,
    /// Rolling-moment coefficient about **e_r**.
    pub roll: f64,
    /// Pitching-moment coefficient about **e_p**, positive nose-up.
    pub pitch: f64,
    /// Moment coefficient about **n** (spin-down when it opposes ω_s).
    pub spin: f64,
}

/// Where a coefficient set comes from, so every result can say how far to trust it.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct ModelInfo {
    /// Short name of the set, e.g. "Hummel (2003) linear model".
    pub name: String,
    /// Source: author, year, title, table; or "estimate from the outline"; or "invented for demos".
    pub source: String,
    /// Confidence note, e.g. "values from memory, unverified".
    pub confidence: String,
}

/// A model of a disc's aerodynamic coefficients.
pub trait AeroModel: Send + Sync + std::fmt::Debug {
    /// The coefficients at one instant.
    fn coefficients(&self, input: &AeroInput) -> AeroCoefficients;
    /// Name, source and confidence of the set.
    fn info(&self) -> ModelInfo;
}
