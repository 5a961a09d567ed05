use super::LayupError;
use serde::{Deserialize, Serialize};

/// A material of a layup. The density is stored in kg/m³; designers usually speak g/cm³
/// (1 g/cm³ = 1000 kg/m³): see [`Material::from_g_cm3`] and [`Material::density_g_cm3`].
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct Material {
    /// Name shown in reports.
    pub name: String,
    /// Density, kg/m³.
    pub density_kg_m3: f64,
}

impl Material {
    /// Lightest accepted material, kg/m³ (lighter than any solid foam).
    pub const MIN_DENSITY_KG_M3: f64 = 1.0;
    /// Densest accepted material, kg/m³ (denser than any element).
    pub const MAX_DENSITY_KG_M3: f64 = 30_000.0;

    /// A material with density in kg/m³, checked to lie in [1, 30 000] kg/m³.
    pub fn from_kg_m3(name: impl Into<String>, density_kg_m3: f64) -> Result<Self, LayupError> {
        let material = Self { name: name.into(), density_kg_m3 };
        material.validate()?;
        Ok(material)
    }

    /// A material with density in g/cm³, checked to lie in [0.001, 30] g/cm³.
    pub fn from_g_cm3(name: impl Into<String>, density_g_cm3: f64) -> Result<Self, LayupError> {
        Self::from_kg_m3(name, density_g_cm3 * 1000.0)
    }

    /// Density in g/cm³.
    pub fn density_g_cm3(&self) -> f64 {
        self.density_kg_m3 / 1000.0
    }

    /// Checks the density against [1, 30 000] kg/m³ (NaN, zero and negative values are rejected).
    pub fn validate(&self) -> Result<(), LayupError> {
        let d = self.density_kg_m3;
        if (Self::MIN_DENSITY_KG_M3..=Self::MAX_DENSITY_KG_M3).contains(&d) {
            Ok(())
        } else {
            Err(LayupError::DensityOutOfRange {
                material: self.name.clone(),
                density_kg_m3: d,
                min_kg_m3: Self::MIN_DENSITY_KG_M3,
                max_kg_m3: Self::MAX_DENSITY_KG_M3,
            })
        }
    }

    /// The same material with its density multiplied by `factor`.
    pub fn scaled(&self, factor: f64) -> Material {
        Material { name: self.name.clone(), density_kg_m3: self.density_kg_m3 * factor }
    }
}
