//! The wire format: routing identities, the `<IDS|MSG>` delimiter, an HMAC signature, four JSON
//! parts (header, parent header, metadata, content) and optional binary buffers.
use super::header::Header;
use super::signer::Signer;
use serde::Serialize;
use serde_json::{json, Value};

/// The frame separating routing identities from the message.
pub const DELIMITER: &[u8] = b"<IDS|MSG>";

/// Default cap on one message's size, all frames together: 16 MiB (16 777 216 bytes). A cell's
/// code can be up to this size; larger messages are dropped unread. Change it for a kernel with
/// the environment variable `SPINFOIL_MAX_MESSAGE_MB` (see `KernelLimits::from_env`).
pub const DEFAULT_MAX_MESSAGE_BYTES: usize = 16 * 1024 * 1024;

/// Why a multipart message was not accepted.
#[derive(Debug, thiserror::Error, PartialEq)]
#[non_exhaustive]
pub enum WireError {
    /// No `<IDS|MSG>` frame.
    #[error("no <IDS|MSG> delimiter among {0} frames")]
    NoDelimiter(usize),
    /// Fewer than signature + four JSON frames after the delimiter.
    #[error("{0} frames after the delimiter; at least 5 are needed")]
    TooFewFrames(usize),
    /// The HMAC signature does not match.
    #[error("bad signature on a {0} message")]
    BadSignature(String),
    /// The frames together exceed the size cap.
    #[error("message of {bytes} bytes exceeds the cap of {limit} bytes")]
    TooLarge {
        /// Size of all frames together, bytes.
        bytes: usize,
        /// The cap, bytes.
        limit: usize,
    },
    /// A JSON part could not be parsed.
    #[error("the {part} part is not valid JSON: {message}")]
    Json {
        /// Which part: header, parent_header, metadata or content.
        part: &'static str,
        /// The parser's message.
        message: String,
    },
}

/// One Jupyter message with its routing identities.
#[derive(Debug, Clone, PartialEq)]
pub struct WireMessage {
    /// ZeroMQ routing identities (ROUTER sockets) or the topic (IOPub).
    pub identities: Vec<Vec<u8>>,
    /// This message's header.
    pub header: Header,
    /// The header of the request this answers (`{}` when none).
    pub parent_header: Value,
    /// Free-form metadata.
    pub metadata: Value,
    /// The message type's content.
    pub content: Value,
    /// Extra binary buffers.
    pub buffers: Vec<Vec<u8>>,
}

impl WireMessage {
    /// Parses and verifies one multipart message after checking that its frames together hold
    /// at most `max_bytes` bytes ([`DEFAULT_MAX_MESSAGE_BYTES`] in the kernel).
    pub fn parse_within(frames: Vec<Vec<u8>>, signer: &Signer, max_bytes: usize) -> Result<Self, WireError> {
        let bytes = frames.iter().map(Vec::len).fold(0_usize, usize::saturating_add);
        if bytes > max_bytes {
            return Err(WireError::TooLarge { bytes, limit: max_bytes });
        }
        Self::parse(frames, signer)
    }

    /// Parses and verifies the frames of one multipart message (no size cap).
    pub fn parse(frames: Vec<Vec<u8>>, signer: &Signer) -> Result<Self, WireError> {
        let count = frames.len();
        let split = frames.iter().position(|f| f == DELIMITER).ok_or(WireError::NoDelimiter(count))?;
        let mut frames = frames.into_iter();
        let identities: Vec<Vec<u8>> = frames.by_ref().take(split).collect();
        let rest: Vec<Vec<u8>> = frames.skip(1).collect();
        if rest.len() < 5 {
            return Err(WireError::TooFewFrames(rest.len()));
        }
        let parts: Vec<&[u8]> = rest[1..5].iter().map(Vec::as_slice).collect();
        let header: Header = parse_part("header", parts[0])?;
        if !signer.verify(&parts, &rest[0]) {
            return Err(WireError::BadSignature(header.msg_type));
        }
        Ok(Self {
            identities,
            header,
            parent_header: parse_part("parent_header", parts[1])?,
            metadata: parse_part("metadata", parts[2])?,
            content: parse_part("content", parts[3])?,
            buffers: rest[5..].to_vec(),
        })
    }

    /// The signed frames of this message, identities first.
    pub fn to_frames(&self, signer: &Signer) -> Vec<Vec<u8>> {
        let parts = [
            to_json(&self.header),
            to_json(&self.parent_header),
            to_json(&self.metadata),
            to_json(&self.content),
        ];
        let refs: Vec<&[u8]> = parts.iter().map(Vec::as_slice).collect();
        let signature = signer.sign(&refs).into_bytes();
        let mut frames = self.identities.clone();
        frames.push(DELIMITER.to_vec());
        frames.push(signature);
        frames.extend(parts);
        frames.extend(self.buffers.iter().cloned());
        frames
    }

    /// A reply (or IOPub message) of `msg_type` to this request: same session and identities,
    /// this header as parent.
    pub fn reply(&self, msg_type: &str, content: impl Serialize) -> Self {
        Self {
            identities: self.identities.clone(),
            header: Header::new(msg_type, &self.header.session),
            parent_header: to_value(&self.header),
            metadata: json!({}),
            content: to_value(&content),
            buffers: Vec::new(),
        }
    }

    /// A message with no parent, e.g. the `starting` status.
    pub fn orphan(msg_type: &str, session: &str, content: impl Serialize) -> Self {
        Self {
            identities: Vec::new(),
            header: Header::new(msg_type, session),
            parent_header: json!({}),
            metadata: json!({}),
            content: to_value(&content),
            buffers: Vec::new(),
        }
    }

    /// The content as a typed struct (missing or wrong fields are an error).
    pub fn content_as<T: serde::de::DeserializeOwned>(&self) -> Result<T, WireError> {
        serde_json::from_value(self.content.clone())
            .map_err(|e| WireError::Json { part: "content", message: e.to_string() })
    }
}

fn parse_part<T: serde::de::DeserializeOwned>(part: &'static str, bytes: &[u8]) -> Result<T, WireError> {
    serde_json::from_slice(bytes).map_err(|e| WireError::Json { part, message: e.to_string() })
}

fn to_json(value: &impl Serialize) -> Vec<u8> {
    serde_json::to_vec(value).unwrap_or_else(|_| b"{}".to_vec())
}

fn to_value(value: &impl Serialize) -> Value {
    serde_json::to_value(value).unwrap_or_else(|_| json!({}))
}

#[cfg(test)]
mod tests {
    use super::*;

    fn request(signer: &Signer) -> Vec<Vec<u8>> {
        let header = json!({"msg_id": "m1", "session": "s1", "username": "u", "date": "",
            "msg_type": "execute_request", "version": "5.3"});
        let parts: Vec<Vec<u8>> = [header, json!({}), json!({}), json!({"code": "1 + 1"})]
            .iter()
            .map(|v| serde_json::to_vec(v).unwrap())
            .collect();
        let refs: Vec<&[u8]> = parts.iter().map(Vec::as_slice).collect();
        let mut frames = vec![b"peer-a".to_vec(), b"peer-b".to_vec(), DELIMITER.to_vec()];
        frames.push(signer.sign(&refs).into_bytes());
        frames.extend(parts);
        frames.push(b"\x00\x01raw".to_vec());
        frames
    }

    #[test]
    fn splits_identities_parts_and_buffers() {
        let signer = Signer::new("key");
        let message = WireMessage::parse(request(&signer), &signer).unwrap();
        assert_eq!(message.identities, vec![b"peer-a".to_vec(), b"peer-b".to_vec()]);
        assert_eq!(message.header.msg_type, "execute_request");
        assert_eq!(message.content["code"], "1 + 1");
        assert_eq!(message.buffers, vec![b"\x00\x01raw".to_vec()]);
    }

    #[test]
    fn a_round_trip_through_frames_keeps_the_message() {
        let signer = Signer::new("key");
        let message = WireMessage::parse(request(&signer), &signer).unwrap();
        let again = WireMessage::parse(message.to_frames(&signer), &signer).unwrap();
        assert_eq!(again, message);
    }

    #[test]
    fn rejects_a_tampered_content_and_a_wrong_key() {
        let signer = Signer::new("key");
        let mut frames = request(&signer);
        frames[6] = br#"{"code": "2 + 2"}"#.to_vec();
        assert_eq!(WireMessage::parse(frames, &signer), Err(WireError::BadSignature("execute_request".into())));
        let other = Signer::new("other key");
        assert!(matches!(WireMessage::parse(request(&signer), &other), Err(WireError::BadSignature(_))));
    }

    #[test]
    fn rejects_malformed_framing() {
        let signer = Signer::new("key");
        assert_eq!(WireMessage::parse(vec![b"x".to_vec()], &signer), Err(WireError::NoDelimiter(1)));
        let short = vec![DELIMITER.to_vec(), b"sig".to_vec(), b"{}".to_vec()];
        assert_eq!(WireMessage::parse(short, &signer), Err(WireError::TooFewFrames(2)));
        let mut bad_json = request(&Signer::new(""));
        bad_json[4] = b"{not json".to_vec();
        assert!(matches!(WireMessage::parse(bad_json, &Signer::new("")), Err(WireError::Json { part: "header", .. })));
    }

    #[test]
    fn a_message_over_the_cap_is_refused_before_parsing() {
        let signer = Signer::new("key");
        let frames = request(&signer);
        let size: usize = frames.iter().map(Vec::len).sum();
        assert!(WireMessage::parse_within(frames.clone(), &signer, size).is_ok());
        let refused = WireMessage::parse_within(frames, &signer, size - 1);
        assert_eq!(refused, Err(WireError::TooLarge { bytes: size, limit: size - 1 }));
        let garbage = vec![vec![b'x'; 100]];
        assert!(matches!(WireMessage::parse_within(garbage, &signer, 10), Err(WireError::TooLarge { .. })));
    }

    #[test]
    fn a_reply_is_built_from_its_request() {
        let signer = Signer::new("key");
        let request = WireMessage::parse(request(&signer), &signer).unwrap();
        let reply = request.reply("execute_reply", json!({"status": "ok"}));
        assert_eq!(reply.identities, request.identities);
        assert_eq!(reply.header.msg_type, "execute_reply");
        assert_eq!(reply.header.session, "s1");
        assert_ne!(reply.header.msg_id, request.header.msg_id);
        assert_eq!(reply.parent_header["msg_id"], "m1");
        let frames = reply.to_frames(&signer);
        assert_eq!(frames[2], DELIMITER);
        assert!(WireMessage::parse(frames, &signer).is_ok());
    }
}
