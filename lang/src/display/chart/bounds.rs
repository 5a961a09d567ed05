//! Axis ranges: from the data, padded, optionally with equal scales on both axes.

/// A rectangle in data units.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) struct Bounds {
    /// Smallest x.
    pub x0: f64,
    /// Largest x.
    pub x1: f64,
    /// Smallest y.
    pub y0: f64,
    /// Largest y.
    pub y1: f64,
}

impl Bounds {
    /// The bounds of finite points; `None` when there is none.
    pub fn of(points: impl IntoIterator<Item = (f64, f64)>) -> Option<Self> {
        let mut bounds: Option<Bounds> = None;
        for (x, y) in points.into_iter().filter(|(x, y)| x.is_finite() && y.is_finite()) {
            let b = bounds.get_or_insert(Bounds { x0: x, x1: x, y0: y, y1: y });
            *b = Bounds { x0: b.x0.min(x), x1: b.x1.max(x), y0: b.y0.min(y), y1: b.y1.max(y) };
        }
        bounds
    }

    /// Widened by `fraction` of the span on every side; a zero span becomes ±`min_half_span`.
    pub fn padded(self, fraction: f64, min_half_span: f64) -> Self {
        let (x0, x1) = pad(self.x0, self.x1, fraction, min_half_span);
        let (y0, y1) = pad(self.y0, self.y1, fraction, min_half_span);
        Bounds { x0, x1, y0, y1 }
    }

    /// Grown to include `y` (e.g. the ground line or zero).
    pub fn including_y(self, y: f64) -> Self {
        Bounds { y0: self.y0.min(y), y1: self.y1.max(y), ..self }
    }

    /// Grown to include `x`.
    pub fn including_x(self, x: f64) -> Self {
        Bounds { x0: self.x0.min(x), x1: self.x1.max(x), ..self }
    }

    /// Width in data units.
    pub fn width(&self) -> f64 {
        self.x1 - self.x0
    }

    /// Height in data units.
    pub fn height(&self) -> f64 {
        self.y1 - self.y0
    }

    /// Grown about its centre so one data unit spans the same pixels on both axes of a plot
    /// `plot_px` (width, height) pixels large.
    pub fn equal_scale(self, plot_px: (f64, f64)) -> Self {
        let units_per_px = (self.width() / plot_px.0).max(self.height() / plot_px.1);
        let (x0, x1) = centred(self.x0, self.x1, units_per_px * plot_px.0);
        let (y0, y1) = centred(self.y0, self.y1, units_per_px * plot_px.1);
        Bounds { x0, x1, y0, y1 }
    }
}

fn pad(low: f64, high: f64, fraction: f64, min_half_span: f64) -> (f64, f64) {
    let margin = (high - low) * fraction;
    if high - low < 1e-12 {
        (low - min_half_span, high + min_half_span)
    } else {
        (low - margin, high + margin)
    }
}

fn centred(low: f64, high: f64, span: f64) -> (f64, f64) {
    let middle = 0.5 * (low + high);
    (middle - 0.5 * span, middle + 0.5 * span)
}
