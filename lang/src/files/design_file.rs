//! Designs (disc, throw, environment) as JSON or TOML text.
use crate::packages::{DiscValue, EnvironmentValue, ThrowValue};
use serde::{Deserialize, Serialize};
use spinfoil_engine::{AirSpec, DiscDesign, WindSpec};

/// What a design file holds: exactly one design, tagged with its kind.
#[derive(Debug, Clone, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub(crate) enum DesignFile {
    /// A disc: its design and the name of its coefficient set.
    Disc {
        /// Outline, layup and target mass.
        design: DiscDesign,
        /// Coefficient set name.
        aero: String,
    },
    /// A throw.
    Throw {
        /// The throw.
        throw: ThrowValue,
    },
    /// An environment.
    Environment {
        /// The air.
        air: AirSpec,
        /// The wind.
        wind: WindSpec,
        /// The landing surface preset, if any.
        #[serde(default, skip_serializing_if = "Option::is_none")]
        ground: Option<String>,
    },
}

/// The text format, from the file's extension.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) enum Format {
    /// JSON (`.json`).
    Json,
    /// TOML (`.toml`).
    Toml,
}

impl Format {
    /// The format of `path` (TOML for `.toml`, otherwise JSON).
    pub fn of(path: &str) -> Self {
        if path.to_ascii_lowercase().ends_with(".toml") {
            Format::Toml
        } else {
            Format::Json
        }
    }
}

impl DesignFile {
    /// The file of a disc.
    pub fn of_disc(disc: &DiscValue) -> Self {
        DesignFile::Disc { design: disc.design.clone(), aero: disc.aero_name.clone() }
    }

    /// The file of an environment.
    pub fn of_environment(environment: &EnvironmentValue) -> Self {
        DesignFile::Environment { air: environment.air, wind: environment.wind, ground: environment.ground.clone() }
    }

    /// The text of this file in `format`.
    pub fn to_text(&self, format: Format) -> Result<String, String> {
        match format {
            Format::Json => serde_json::to_string_pretty(self).map_err(|e| e.to_string()),
            Format::Toml => toml::to_string_pretty(self).map_err(|e| e.to_string()),
        }
    }

    /// Parses a file's text.
    pub fn from_text(text: &str, format: Format) -> Result<Self, String> {
        match format {
            Format::Json => serde_json::from_str(text).map_err(|e| e.to_string()),
            Format::Toml => toml::from_str(text).map_err(|e| e.to_string()),
        }
    }

    /// The kind, as users read it.
    pub fn kind(&self) -> &'static str {
        match self {
            DesignFile::Disc { .. } => "disc",
            DesignFile::Throw { .. } => "throw",
            DesignFile::Environment { .. } => "environment",
        }
    }
}
