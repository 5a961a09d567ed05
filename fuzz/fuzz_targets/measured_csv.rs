//! Fuzzes the measured-flight CSV parser (`spinfoil_engine::parse_measured_flights`): any text
//! either parses into flights whose numbers are finite or is refused with a typed error.
#![no_main]
use libfuzzer_sys::fuzz_target;
use spinfoil_engine::{parse_measured_flights, Observation};

fuzz_target!(|data: &[u8]| {
    let Ok(text) = std::str::from_utf8(data) else { return };
    let Ok(flights) = parse_measured_flights(text) else { return };
    for flight in &flights {
        assert!(!flight.observations.is_empty(), "a flight without observations was accepted");
        for observation in &flight.observations {
            let numbers: Vec<f64> = match *observation {
                Observation::Position { time_s, position_m } => [&[time_s][..], &position_m[..]].concat(),
                Observation::Landing { time_s, landing_m } => [&[time_s][..], &landing_m[..]].concat(),
            };
            assert!(numbers.iter().all(|v| v.is_finite()), "non-finite observation accepted: {observation:?}");
        }
    }
});
