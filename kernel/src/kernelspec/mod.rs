//! The kernelspec Jupyter uses to find and start the kernel, and the logo it shows.
mod install;
mod logo;

pub use install::{install, kernel_json, kernels_folder, InstallError, InstallTarget, DISPLAY_NAME, KERNEL_NAME};
pub use logo::{logo_png, logo_rgba, logo_svg};
