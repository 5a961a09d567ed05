//! Writes the kernelspec logo files (SVG, 32×32 and 64×64 PNG) into the folder given, by
//! default `kernel/assets`: `cargo run -p spinfoil-kernel --example draw_logo -- kernel/assets`.
use spinfoil_kernel::kernelspec::{logo_png, logo_svg};
use std::path::PathBuf;

fn main() -> Result<(), Box<dyn std::error::Error>> {
    let folder = PathBuf::from(std::env::args().nth(1).unwrap_or_else(|| "kernel/assets".into()));
    std::fs::create_dir_all(&folder)?;
    std::fs::write(folder.join("logo-svg.svg"), logo_svg())?;
    for size in [32, 64] {
        std::fs::write(folder.join(format!("logo-{size}x{size}.png")), logo_png(size)?)?;
    }
    println!("logo written to {}", folder.display());
    Ok(())
}
