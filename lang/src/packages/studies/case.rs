//! A script's disc, throw and environment as one engine study case.
use crate::packages::{DiscValue, EnvironmentValue, ThrowValue};
use spinfoil_engine::{CaseDisc, CaseModel, ReleaseState, StudyCase};

/// The study case of `disc` thrown with `throw` in `environment` (flights end at first contact
/// unless the environment names a ground).
pub(crate) fn study_case(disc: &DiscValue, throw: &ThrowValue, environment: &EnvironmentValue) -> Result<StudyCase, String> {
    let (release, effort) = match throw {
        ThrowValue::Release(state) => (*state, None),
        ThrowValue::Effort(e) => (pose_release(e), Some(e.effort)),
    };
    let mut case = StudyCase::new(
        CaseDisc::Design { design: disc.design.clone() },
        CaseModel::linear(disc.aero.clone()),
        release,
    );
    case.effort = effort;
    case.air = environment.air;
    case.wind = environment.wind;
    case.ground = environment.ground()?;
    Ok(case)
}

/// A release state carrying an effort throw's pose (its speed and spin come from the effort).
fn pose_release(e: &spinfoil_engine::EffortThrow) -> ReleaseState {
    let p = &e.pose;
    ReleaseState {
        speed_mps: 0.0,
        spin_rad_s: 0.0,
        launch_rad: p.launch_rad,
        nose_rad: p.nose_rad,
        roll_rad: p.roll_rad,
        heading_rad: p.heading_rad,
        height_m: p.height_m,
        off_axis_rate_rad_s: p.off_axis_rate_rad_s,
        off_axis_direction_rad: p.off_axis_direction_rad,
        style: p.style,
        hand: p.hand,
    }
}

/// An input name as scripts may write it: `speed_mps` means `throw.speed_mps`; an effort's
/// option names mean its inputs (`work_j` → `effort.work_j`, `torque_nm` →
/// `effort.wrist_torque_n_m`, `rim_speed_ratio` → `effort.rim_speed_ratio`).
pub(crate) fn input_name(key: &str) -> String {
    match key {
        _ if key.contains('.') => key.to_string(),
        "work_j" | "rim_speed_ratio" | "wrist_torque_n_m" => format!("effort.{key}"),
        "torque_nm" => "effort.wrist_torque_n_m".to_string(),
        _ => format!("throw.{key}"),
    }
}
