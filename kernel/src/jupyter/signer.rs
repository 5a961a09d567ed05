//! HMAC-SHA256 signatures over a message's header, parent header, metadata and content.
use hmac::{Hmac, Mac};
use sha2::Sha256;

type HmacSha256 = Hmac<Sha256>;

/// Signs and verifies messages with the connection file's key (no key: no signatures).
#[derive(Clone)]
pub struct Signer {
    mac: Option<HmacSha256>,
}

impl Signer {
    /// A signer for `key`; an empty key turns signing off, as the protocol specifies.
    pub fn new(key: &str) -> Self {
        let mac = (!key.is_empty())
            .then(|| HmacSha256::new_from_slice(key.as_bytes()).expect("HMAC takes keys of any length"));
        Self { mac }
    }

    /// The lowercase hex signature of the four JSON parts, in order.
    pub fn sign(&self, parts: &[&[u8]]) -> String {
        match self.keyed(parts) {
            Some(mac) => hex::encode(mac.finalize().into_bytes()),
            None => String::new(),
        }
    }

    /// Whether `signature` (hex) is right for the parts, compared in constant time.
    pub fn verify(&self, parts: &[&[u8]], signature: &[u8]) -> bool {
        let Some(mac) = self.keyed(parts) else { return true };
        match std::str::from_utf8(signature).ok().and_then(|s| hex::decode(s).ok()) {
            Some(bytes) => mac.verify_slice(&bytes).is_ok(),
            None => false,
        }
    }

    fn keyed(&self, parts: &[&[u8]]) -> Option<HmacSha256> {
        let mut mac = self.mac.clone()?;
        for part in parts {
            mac.update(part);
        }
        Some(mac)
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn matches_the_rfc_4231_test_case_2() {
        // source: Nystrom (2005), RFC 4231, Identifiers and Test Vectors for HMAC-SHA-256, test case 2
        let signer = Signer::new("Jefe");
        let signature = signer.sign(&[b"what do ya want ", b"for nothing?"]);
        assert_eq!(signature, "5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843");
    }

    #[test]
    fn verifies_its_own_signature_and_rejects_a_changed_part() {
        let signer = Signer::new("secret");
        let signature = signer.sign(&[b"{}", b"{}", b"{}", b"{\"code\":\"1\"}"]);
        assert!(signer.verify(&[b"{}", b"{}", b"{}", b"{\"code\":\"1\"}"], signature.as_bytes()));
        assert!(!signer.verify(&[b"{}", b"{}", b"{}", b"{\"code\":\"2\"}"], signature.as_bytes()));
        assert!(!signer.verify(&[b"{}", b"{}", b"{}", b"{}"], b"not hex"));
    }

    #[test]
    fn an_empty_key_signs_with_an_empty_string() {
        let signer = Signer::new("");
        assert_eq!(signer.sign(&[b"{}"]), "");
        assert!(signer.verify(&[b"{}"], b""));
    }
}
