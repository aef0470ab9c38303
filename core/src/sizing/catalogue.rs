//! What people can buy, as data: vessel and drum volumes, burner and element ratings, copper
//! tube sizes, tub volumes and separator glassware. Every row names its source; a size that is
//! simply what the trade sells says "common practice, no source".

use crate::heat::{Fuel, Metal};
use serde::{Deserialize, Serialize};

/// One purchasable size: its value in SI units, how a shop names it, and where it comes from.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Size {
    pub value: f64,
    pub label: &'static str,
    pub source: &'static str,
}

const fn size(value: f64, label: &'static str, source: &'static str) -> Size {
    Size { value, label, source }
}

const STILL_SIZES: &str =
    "Copper and stainless alembics and pot stills are sold by these volumes (common practice, no source)";
const DRUM_SIZES: &str =
    "Steel and plastic drums: 30, 60, 120 L open-head drums (common practice, no source)";
const DRUM_200: &str =
    "200 L (55 US gal) steel drum, ISO 15750-3 (nominal volume from memory); 216-220 L brim-full";

/// Still bodies (gross volume of the vessel, m³), smallest first.
pub static VESSELS_M3: &[Size] = &[
    size(0.025, "25 L", STILL_SIZES),
    size(0.030, "30 L drum", DRUM_SIZES),
    size(0.050, "50 L", STILL_SIZES),
    size(0.060, "60 L drum", DRUM_SIZES),
    size(0.100, "100 L", STILL_SIZES),
    size(0.120, "120 L drum", DRUM_SIZES),
    size(0.200, "200 L drum", DRUM_200),
    size(0.220, "220 L drum", DRUM_200),
    size(0.300, "300 L", STILL_SIZES),
    size(0.500, "500 L", STILL_SIZES),
    size(1.000, "1000 L", STILL_SIZES),
];

/// Height over diameter of a bought vessel: a 200 L drum is about 851 mm tall and 572 mm across
/// (ISO 15750-3, from memory), 1.49; stills and smaller drums are built near the same shape
/// (common practice, no source).
pub const VESSEL_HEIGHT_TO_DIAMETER: f64 = 1.5;

const GAS_RINGS: &str =
    "LPG and natural-gas boiling rings and stock-pot burners (sea-level ratings, common practice, no source)";
const GAS_JETS: &str = "Jet and cast-iron boiling burners for brewing and catering (sea-level ratings, common practice, no source)";

/// Gas burners, sea-level rating in W, smallest first.
pub static GAS_BURNERS_W: &[Size] = &[
    size(3_500.0, "3.5 kW ring", GAS_RINGS),
    size(5_000.0, "5 kW ring", GAS_RINGS),
    size(7_000.0, "7 kW ring", GAS_RINGS),
    size(9_000.0, "9 kW ring", GAS_RINGS),
    size(12_000.0, "12 kW burner", GAS_JETS),
    size(15_000.0, "15 kW burner", GAS_JETS),
    size(20_000.0, "20 kW burner", GAS_JETS),
    size(30_000.0, "30 kW burner", GAS_JETS),
    size(40_000.0, "40 kW burner", GAS_JETS),
    size(60_000.0, "60 kW burner", GAS_JETS),
    size(100_000.0, "100 kW burner", GAS_JETS),
];

const WOOD: &str = "A wood fire has no bought rating: the heat it releases is set by how fast it is fed; steps of this size are what a stoker can hold (common practice, no source)";

/// Wood fires: the heat release to aim the stoking at, W, smallest first.
pub static WOOD_FIRES_W: &[Size] = &[
    size(10_000.0, "10 kW fire", WOOD),
    size(15_000.0, "15 kW fire", WOOD),
    size(20_000.0, "20 kW fire", WOOD),
    size(30_000.0, "30 kW fire", WOOD),
    size(40_000.0, "40 kW fire", WOOD),
    size(60_000.0, "60 kW fire", WOOD),
    size(80_000.0, "80 kW fire", WOOD),
    size(120_000.0, "120 kW fire", WOOD),
    size(200_000.0, "200 kW fire", WOOD),
];

const ELEMENTS: &str =
    "Screw-in immersion elements for water heaters, urns and brewing boilers (common practice, no source)";
const ELEMENT_BANKS: &str =
    "Two or more elements of the single sizes, each on its own circuit or phase (common practice, no source)";

/// Electric immersion elements (and banks of them), W, smallest first.
pub static ELEMENTS_W: &[Size] = &[
    size(2_000.0, "2 kW element", ELEMENTS),
    size(3_000.0, "3 kW element", ELEMENTS),
    size(4_500.0, "4.5 kW element", ELEMENTS),
    size(6_000.0, "6 kW element", ELEMENTS),
    size(9_000.0, "9 kW element", ELEMENTS),
    size(12_000.0, "2 × 6 kW elements", ELEMENT_BANKS),
    size(18_000.0, "2 × 9 kW elements", ELEMENT_BANKS),
    size(27_000.0, "3 × 9 kW elements", ELEMENT_BANKS),
    size(36_000.0, "4 × 9 kW elements", ELEMENT_BANKS),
];

/// The ratings a heat source is bought (or fed) in.
pub fn heat_ratings(fuel: Fuel) -> &'static [Size] {
    match fuel {
        Fuel::Propane | Fuel::NaturalGas => GAS_BURNERS_W,
        Fuel::Firewood => WOOD_FIRES_W,
        Fuel::Electricity => ELEMENTS_W,
    }
}

/// Which copper tube a shop sells.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default, Serialize, Deserialize)]
#[cfg_attr(feature = "cli", derive(schemars::JsonSchema))]
#[serde(rename_all = "snake_case")]
pub enum TubeStandard {
    /// Metric plumbing tube, named by outer diameter in mm (EN 1057).
    #[default]
    Metric,
    /// US refrigeration (ACR) tube, named by outer diameter in inches (ASTM B280).
    Us,
}

/// One copper tube: outer diameter and wall, m.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Tube {
    pub outer_diameter_m: f64,
    pub wall_m: f64,
    pub label: &'static str,
    pub source: &'static str,
}

impl Tube {
    pub fn inner_diameter_m(&self) -> f64 {
        self.outer_diameter_m - 2.0 * self.wall_m
    }
}

const EN_1057: &str =
    "EN 1057 outer diameter; 1.0 mm wall, a common soft-coil (R220) wall for these sizes (wall from memory)";
const B280: &str = "ASTM B280 (ACR tube, named by its outer diameter); soft-coil wall from memory";
/// International inch, m (NIST SP 811, B.8).
const INCH_M: f64 = 0.0254;

const fn tube(outer_diameter_m: f64, wall_m: f64, label: &'static str, source: &'static str) -> Tube {
    Tube { outer_diameter_m, wall_m, label, source }
}

/// Metric copper tube, smallest first.
pub static METRIC_TUBES: &[Tube] = &[
    tube(0.010, 0.001, "10 × 1 mm", EN_1057),
    tube(0.012, 0.001, "12 × 1 mm", EN_1057),
    tube(0.015, 0.001, "15 × 1 mm", EN_1057),
    tube(0.018, 0.001, "18 × 1 mm", EN_1057),
    tube(0.022, 0.001, "22 × 1 mm", EN_1057),
    tube(0.028, 0.001, "28 × 1 mm", EN_1057),
];

/// US copper tube named by its outer diameter, smallest first.
pub static US_TUBES: &[Tube] = &[
    tube(0.375 * INCH_M, 0.032 * INCH_M, "3/8 in OD", B280),
    tube(0.500 * INCH_M, 0.032 * INCH_M, "1/2 in OD", B280),
    tube(0.625 * INCH_M, 0.035 * INCH_M, "5/8 in OD", B280),
    tube(0.750 * INCH_M, 0.042 * INCH_M, "3/4 in OD", B280),
    tube(0.875 * INCH_M, 0.045 * INCH_M, "7/8 in OD", B280),
    tube(1.125 * INCH_M, 0.050 * INCH_M, "1 1/8 in OD", B280),
];

/// The tubes of one standard.
pub fn tubes(standard: TubeStandard) -> &'static [Tube] {
    match standard {
        TubeStandard::Metric => METRIC_TUBES,
        TubeStandard::Us => US_TUBES,
    }
}

const TUBS: &str = "Water butts, drums and open tanks sold by these volumes (common practice, no source)";

/// Tubs for a coil (gross volume, m³), smallest first.
pub static TUBS_M3: &[Size] = &[
    size(0.030, "30 L", TUBS),
    size(0.060, "60 L drum", DRUM_SIZES),
    size(0.100, "100 L", TUBS),
    size(0.120, "120 L drum", DRUM_SIZES),
    size(0.200, "200 L drum", DRUM_200),
    size(0.300, "300 L", TUBS),
    size(0.500, "500 L", TUBS),
    size(1.000, "1000 L tank", TUBS),
    size(2.000, "2000 L tank", TUBS),
];

const GLASS: &str = "Laboratory separating funnels and Florentine flasks, 0.25-2 L in borosilicate glass (common practice, no source)";
const BIG_RECEIVER: &str = "Glass or stainless receivers of 5-20 L (common practice, no source)";

/// Separators (oil-water receivers), volume m³, smallest first.
pub static SEPARATORS_M3: &[Size] = &[
    size(0.25e-3, "0.25 L", GLASS),
    size(0.5e-3, "0.5 L", GLASS),
    size(1.0e-3, "1 L", GLASS),
    size(2.0e-3, "2 L", GLASS),
    size(5.0e-3, "5 L", BIG_RECEIVER),
    size(10.0e-3, "10 L", BIG_RECEIVER),
    size(20.0e-3, "20 L", BIG_RECEIVER),
];

/// Sheet a still body of this metal is usually made of: thickness (m), density (kg/m³).
///
/// Densities: copper 8960, austenitic stainless (304) 7930, carbon steel 7850, aluminium 2700
/// kg/m³ (CRC Handbook of Chemistry and Physics, from memory). Thicknesses: copper and stainless
/// alembics 1.5 mm, drum steel 1.2 mm, aluminium pots 2 mm (common practice, no source).
pub fn sheet(metal: Metal) -> (f64, f64) {
    match metal {
        Metal::Copper => (0.0015, 8960.0),
        Metal::StainlessSteel => (0.0015, 7930.0),
        Metal::CarbonSteel => (0.0012, 7850.0),
        Metal::Aluminium => (0.002, 2700.0),
    }
}

/// The smallest size at or above `needed` (with a relative slack of 1e-9 for round-off).
///
/// ```
/// use stillroom_core::sizing::catalogue::{smallest_at_least, VESSELS_M3};
/// assert_eq!(smallest_at_least(VESSELS_M3, 0.055).unwrap().label, "60 L drum");
/// assert!(smallest_at_least(VESSELS_M3, 2.0).is_none());
/// ```
pub fn smallest_at_least(sizes: &'static [Size], needed: f64) -> Option<&'static Size> {
    sizes.iter().find(|s| s.value >= needed * (1.0 - 1e-9))
}

/// The size just below `size` in its table, if any.
pub fn next_smaller(sizes: &'static [Size], value: f64) -> Option<&'static Size> {
    sizes.iter().rev().find(|s| s.value < value * (1.0 - 1e-9))
}
