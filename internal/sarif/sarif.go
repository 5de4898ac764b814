// Package sarif writes analysis findings as a SARIF 2.1.0 log, the
// interchange format that code-scanning services and editors read.
//
// Only the subset of the format that overfact fills in is modelled: one
// run, one tool component with its rules, results with regions, related
// locations and fixes, and a source-root base URI so that artifact URIs
// stay relative and the log is portable between checkouts.
//
// The property names and their meaning follow the OASIS standard "Static
// Analysis Results Interchange Format (SARIF) Version 2.1.0"; section
// numbers in the comments refer to it.
package sarif

// Version is the SARIF version written into every log (§3.13.2).
const Version = "2.1.0"

// SchemaURI names the JSON schema of Version (§3.13.3).
const SchemaURI = "https://json.schemastore.org/sarif-2.1.0.json"

// SourceRoot is the uriBaseId every artifact location is relative to
// (§3.4.4); the run maps it to an absolute URI in originalUriBaseIds.
const SourceRoot = "SRCROOT"

// Log is the top-level sarifLog object (§3.13).
type Log struct {
	Schema  string `json:"$schema"`
	Version string `json:"version"`
	Runs    []Run  `json:"runs"`
}

// Run is a run object (§3.14).
type Run struct {
	Tool               Tool                        `json:"tool"`
	OriginalURIBaseIDs map[string]ArtifactLocation `json:"originalUriBaseIds,omitempty"`
	// ColumnKind is written explicitly although utf16CodeUnits is the
	// default (§3.14.27), so that readers need not know the default.
	ColumnKind string   `json:"columnKind"`
	Results    []Result `json:"results"`
}

// Tool is a tool object (§3.18).
type Tool struct {
	Driver ToolComponent `json:"driver"`
}

// ToolComponent is a toolComponent object (§3.19).
type ToolComponent struct {
	Name           string                `json:"name"`
	Version        string                `json:"version,omitempty"`
	InformationURI string                `json:"informationUri,omitempty"`
	Rules          []ReportingDescriptor `json:"rules"`
}

// ReportingDescriptor is a reportingDescriptor object describing one rule
// (§3.49).
type ReportingDescriptor struct {
	ID                   string                  `json:"id"`
	Name                 string                  `json:"name,omitempty"`
	ShortDescription     *Message                `json:"shortDescription,omitempty"`
	FullDescription      *Message                `json:"fullDescription,omitempty"`
	HelpURI              string                  `json:"helpUri,omitempty"`
	DefaultConfiguration *ReportingConfiguration `json:"defaultConfiguration,omitempty"`
}

// ReportingConfiguration is a reportingConfiguration object (§3.50).
type ReportingConfiguration struct {
	Level string `json:"level,omitempty"`
}

// Message is a message object holding plain text (§3.11).
type Message struct {
	Text string `json:"text"`
}

// Result is a result object (§3.27).
type Result struct {
	RuleID           string     `json:"ruleId"`
	RuleIndex        int        `json:"ruleIndex"`
	Level            string     `json:"level,omitempty"`
	Message          Message    `json:"message"`
	Locations        []Location `json:"locations"`
	RelatedLocations []Location `json:"relatedLocations,omitempty"`
	Fixes            []Fix      `json:"fixes,omitempty"`
}

// Location is a location object (§3.28).
type Location struct {
	// ID identifies a related location within its result (§3.28.2); it
	// is only set on related locations.
	ID               *int             `json:"id,omitempty"`
	PhysicalLocation PhysicalLocation `json:"physicalLocation"`
	Message          *Message         `json:"message,omitempty"`
}

// PhysicalLocation is a physicalLocation object (§3.29).
type PhysicalLocation struct {
	ArtifactLocation ArtifactLocation `json:"artifactLocation"`
	Region           *Region          `json:"region,omitempty"`
}

// ArtifactLocation is an artifactLocation object (§3.4).
type ArtifactLocation struct {
	URI       string `json:"uri"`
	URIBaseID string `json:"uriBaseId,omitempty"`
}

// Region is a region object given by lines and columns (§3.30). Lines
// and columns are 1-based; columns count UTF-16 code units, the run's
// columnKind. An insertion point has equal start and end. A column is
// left out when it is not known (a //line directive without one).
type Region struct {
	StartLine   int `json:"startLine"`
	StartColumn int `json:"startColumn,omitempty"`
	EndLine     int `json:"endLine"`
	EndColumn   int `json:"endColumn,omitempty"`
}

// Fix is a fix object (§3.55).
type Fix struct {
	Description     *Message         `json:"description,omitempty"`
	ArtifactChanges []ArtifactChange `json:"artifactChanges"`
}

// ArtifactChange is an artifactChange object (§3.56).
type ArtifactChange struct {
	ArtifactLocation ArtifactLocation `json:"artifactLocation"`
	Replacements     []Replacement    `json:"replacements"`
}

// Replacement is a replacement object (§3.57).
type Replacement struct {
	DeletedRegion   Region           `json:"deletedRegion"`
	InsertedContent *ArtifactContent `json:"insertedContent,omitempty"`
}

// ArtifactContent is an artifactContent object holding text (§3.3).
type ArtifactContent struct {
	Text string `json:"text"`
}
