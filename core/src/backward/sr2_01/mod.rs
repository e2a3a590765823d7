//! placeholder, replaced by the owner of this folder
