//! Spinfoil's logo, drawn from a few shapes: a disc seen nearly edge-on (rim, top, flight
//! plate) under an arc with an arrowhead for its spin. The same shapes give the SVG and the PNGs.
//! `cargo run -p spinfoil-kernel --example draw_logo -- kernel/assets` regenerates the files.

/// Width and height of the drawing's own coordinate system (SVG user units).
const CANVAS: f64 = 64.0;
/// Subsamples per pixel side when rasterising.
const SUPERSAMPLING: usize = 8;

/// One filled shape, in canvas units (y down).
#[derive(Debug, Clone, Copy)]
enum Shape {
    /// A filled ellipse: centre, radii, colour.
    Ellipse { cx: f64, cy: f64, rx: f64, ry: f64, colour: [u8; 3] },
    /// A stroked elliptical arc from `from_deg` down to `to_deg` (angles counter-clockwise, y up).
    Arc { cx: f64, cy: f64, rx: f64, ry: f64, from_deg: f64, to_deg: f64, width: f64, colour: [u8; 3] },
    /// A filled triangle.
    Triangle { points: [(f64, f64); 3], colour: [u8; 3] },
}

const RIM: [u8; 3] = [0x1d, 0x4e, 0x5f];
const TOP: [u8; 3] = [0x2f, 0x8f, 0x9d];
const PLATE: [u8; 3] = [0x8c, 0xd3, 0xd9];
const SPIN: [u8; 3] = [0xf0, 0x8a, 0x24];

/// The shapes from back to front.
fn shapes() -> Vec<Shape> {
    let (cx, cy, rx, ry) = (31.0, 31.0, 26.0, 16.0);
    let (end_deg, width) = (22.0_f64, 4.0);
    let end = arc_point(cx, cy, rx, ry, end_deg);
    let t = end_deg.to_radians();
    let direction = unit(rx * t.sin(), ry * t.cos());
    let normal = (-direction.1, direction.0);
    let tip = (end.0 + 6.5 * direction.0, end.1 + 6.5 * direction.1);
    let base = |s: f64| (end.0 + s * 5.0 * normal.0, end.1 + s * 5.0 * normal.1);
    vec![
        Shape::Ellipse { cx: 32.0, cy: 42.0, rx: 27.0, ry: 10.0, colour: RIM },
        Shape::Ellipse { cx: 32.0, cy: 38.5, rx: 27.0, ry: 9.0, colour: TOP },
        Shape::Ellipse { cx: 32.0, cy: 38.0, rx: 15.0, ry: 4.5, colour: PLATE },
        Shape::Arc { cx, cy, rx, ry, from_deg: 165.0, to_deg: end_deg, width, colour: SPIN },
        Shape::Triangle { points: [tip, base(1.0), base(-1.0)], colour: SPIN },
    ]
}

fn unit(x: f64, y: f64) -> (f64, f64) {
    let n = x.hypot(y);
    (x / n, y / n)
}

fn arc_point(cx: f64, cy: f64, rx: f64, ry: f64, deg: f64) -> (f64, f64) {
    let t = deg.to_radians();
    (cx + rx * t.cos(), cy - ry * t.sin())
}

fn hex(colour: [u8; 3]) -> String {
    format!("#{:02x}{:02x}{:02x}", colour[0], colour[1], colour[2])
}

/// The logo as an SVG document (64 × 64 user units).
pub fn logo_svg() -> String {
    let mut svg = format!(
        "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{CANVAS}\" height=\"{CANVAS}\" viewBox=\"0 0 {CANVAS} {CANVAS}\">\n"
    );
    for shape in shapes() {
        svg.push_str(&svg_element(&shape));
        svg.push('\n');
    }
    svg.push_str("</svg>\n");
    svg
}

fn svg_element(shape: &Shape) -> String {
    match *shape {
        Shape::Ellipse { cx, cy, rx, ry, colour } => {
            format!("  <ellipse cx=\"{cx}\" cy=\"{cy}\" rx=\"{rx}\" ry=\"{ry}\" fill=\"{}\"/>", hex(colour))
        }
        Shape::Arc { cx, cy, rx, ry, from_deg, to_deg, width, colour } => {
            let (a, b) = (arc_point(cx, cy, rx, ry, from_deg), arc_point(cx, cy, rx, ry, to_deg));
            format!(
                "  <path d=\"M {:.2} {:.2} A {rx} {ry} 0 0 1 {:.2} {:.2}\" fill=\"none\" stroke=\"{}\" stroke-width=\"{width}\"/>",
                a.0, a.1, b.0, b.1, hex(colour)
            )
        }
        Shape::Triangle { points, colour } => {
            let list: Vec<String> = points.iter().map(|(x, y)| format!("{x:.2},{y:.2}")).collect();
            format!("  <polygon points=\"{}\" fill=\"{}\"/>", list.join(" "), hex(colour))
        }
    }
}

/// Whether canvas point (x, y) lies in `shape`.
fn covers(shape: &Shape, x: f64, y: f64) -> bool {
    match *shape {
        Shape::Ellipse { cx, cy, rx, ry, .. } => ((x - cx) / rx).powi(2) + ((y - cy) / ry).powi(2) <= 1.0,
        Shape::Arc { cx, cy, rx, ry, from_deg, to_deg, width, .. } => {
            let (u, v) = ((x - cx) / rx, -(y - cy) / ry);
            let angle = v.atan2(u).to_degrees();
            let f = u * u + v * v;
            let gradient = 2.0 * ((x - cx) / (rx * rx)).hypot((y - cy) / (ry * ry));
            angle >= to_deg && angle <= from_deg && ((f - 1.0) / gradient).abs() <= width / 2.0
        }
        Shape::Triangle { points: [a, b, c], .. } => {
            let side = |p: (f64, f64), q: (f64, f64)| (q.0 - p.0) * (y - p.1) - (q.1 - p.1) * (x - p.0);
            let (d1, d2, d3) = (side(a, b), side(b, c), side(c, a));
            (d1 >= 0.0 && d2 >= 0.0 && d3 >= 0.0) || (d1 <= 0.0 && d2 <= 0.0 && d3 <= 0.0)
        }
    }
}

fn colour_of(shape: &Shape) -> [u8; 3] {
    match *shape {
        Shape::Ellipse { colour, .. } | Shape::Arc { colour, .. } | Shape::Triangle { colour, .. } => colour,
    }
}

/// The logo as RGBA pixels, `size` × `size`, anti-aliased by supersampling.
pub fn logo_rgba(size: usize) -> Vec<u8> {
    let shapes = shapes();
    let mut pixels = Vec::with_capacity(size * size * 4);
    for row in 0..size {
        for col in 0..size {
            pixels.extend(pixel(&shapes, size, row, col));
        }
    }
    pixels
}

fn pixel(shapes: &[Shape], size: usize, row: usize, col: usize) -> [u8; 4] {
    let scale = CANVAS / size as f64;
    let n = SUPERSAMPLING;
    let mut sum = [0.0f64; 4];
    for sub in 0..n * n {
        let x = (col as f64 + ((sub % n) as f64 + 0.5) / n as f64) * scale;
        let y = (row as f64 + ((sub / n) as f64 + 0.5) / n as f64) * scale;
        if let Some(shape) = shapes.iter().rev().find(|s| covers(s, x, y)) {
            let c = colour_of(shape);
            sum = [sum[0] + c[0] as f64, sum[1] + c[1] as f64, sum[2] + c[2] as f64, sum[3] + 255.0];
        }
    }
    let covered = sum[3] / 255.0;
    if covered == 0.0 {
        return [0, 0, 0, 0];
    }
    let channel = |k: usize| (sum[k] / covered).round() as u8;
    [channel(0), channel(1), channel(2), (sum[3] / (n * n) as f64).round() as u8]
}

/// The logo as a PNG file's bytes, `size` × `size` pixels.
pub fn logo_png(size: usize) -> Result<Vec<u8>, png::EncodingError> {
    let mut bytes = Vec::new();
    {
        let mut encoder = png::Encoder::new(&mut bytes, size as u32, size as u32);
        encoder.set_color(png::ColorType::Rgba);
        encoder.set_depth(png::BitDepth::Eight);
        let mut writer = encoder.write_header()?;
        writer.write_image_data(&logo_rgba(size))?;
    }
    Ok(bytes)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn the_committed_logo_files_are_what_the_drawing_produces() {
        assert_eq!(logo_svg(), include_str!("../../assets/logo-svg.svg"));
        assert_eq!(logo_png(32).unwrap(), include_bytes!("../../assets/logo-32x32.png"));
        assert_eq!(logo_png(64).unwrap(), include_bytes!("../../assets/logo-64x64.png"));
    }

    #[test]
    fn corners_are_transparent_and_the_disc_is_opaque() {
        let pixels = logo_rgba(64);
        assert_eq!(pixels[3], 0);
        let centre = (50 * 64 + 32) * 4;
        assert_eq!(&pixels[centre..centre + 4], &[RIM[0], RIM[1], RIM[2], 255]);
    }
}
