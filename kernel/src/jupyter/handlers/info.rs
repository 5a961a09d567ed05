//! `kernel_info_reply`: who this kernel is and which language it speaks.
use crate::jupyter::header::PROTOCOL_VERSION;
use serde_json::{json, Value};

/// The content of a `kernel_info_reply`.
pub fn kernel_info() -> Value {
    json!({
        "status": "ok",
        "protocol_version": PROTOCOL_VERSION,
        "implementation": "spinfoil",
        "implementation_version": env!("CARGO_PKG_VERSION"),
        "language_info": {
            "name": spinfoil_lang::LANGUAGE_NAME,
            "version": spinfoil_lang::language_version(),
            "mimetype": "text/x-spinfoil",
            "file_extension": spinfoil_lang::FILE_EXTENSION,
            "pygments_lexer": "rust",
            "codemirror_mode": "rust",
        },
        "banner": format!(
            "Spinfoil {} - studies of spin-stabilised flying discs. Type help() for the functions.",
            env!("CARGO_PKG_VERSION")
        ),
        "help_links": [],
        "debugger": false,
    })
}
