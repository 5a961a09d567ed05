//! Ground: surfaces, contact with the rim, impacts and ground play after landing.
