import { PasswordResetToken } from '../auth/password-reset-token.entity';
import { CertificateRevocation } from '../certificates/certificate-revocation.entity';
import { Certificate } from '../certificates/certificate.entity';
import { CustomerOrder } from '../customers/customer-order.entity';
import { Customer } from '../customers/customer.entity';
import { CapturedMail } from '../mail/captured-mail.entity';
import { MailAttachment } from '../mail/mail-attachment.entity';
import { MailAttempt } from '../mail/mail-attempt.entity';
import { MailMessage } from '../mail/mail-message.entity';
import { GrindRequestStep } from '../replacements/grind-request-step.entity';
import { GrindRequest } from '../replacements/grind-request.entity';
import { MatchedSet } from '../sets/matched-set.entity';
import { SetMember } from '../sets/set-member.entity';
import { AuditEntry } from '../audit/audit-entry.entity';
import { GaugeStudyMeasurement } from '../gauge-studies/gauge-study-measurement.entity';
import { GaugeStudySlot } from '../gauge-studies/gauge-study-slot.entity';
import { GaugeStudy } from '../gauge-studies/gauge-study.entity';
import { BenchRun } from '../inspections/bench-run.entity';
import { InspectionReading } from '../inspections/inspection-reading.entity';
import { InspectionResult } from '../inspections/inspection-result.entity';
import { Inspection } from '../inspections/inspection.entity';
import { Instrument } from '../instruments/instrument.entity';
import { Lot } from '../lots/lot.entity';
import { PartDisposition } from '../lots/part-disposition.entity';
import { Part } from '../lots/part.entity';
import { CalibrationCertificate } from '../masters/calibration-certificate.entity';
import { MasterCalibration } from '../masters/master-calibration.entity';
import { MasterGauge } from '../masters/master-gauge.entity';
import { Material } from '../materials/material.entity';
import { Spec } from '../specs/spec.entity';
import { User } from '../users/user.entity';

/** Every entity, listed once so the app, the CLI and the tests see the same schema. */
export const ENTITIES = [
  User,
  AuditEntry,
  Material,
  Spec,
  MasterGauge,
  MasterCalibration,
  CalibrationCertificate,
  Instrument,
  Lot,
  Part,
  PartDisposition,
  BenchRun,
  Inspection,
  InspectionReading,
  InspectionResult,
  PasswordResetToken,
  Customer,
  CustomerOrder,
  MatchedSet,
  SetMember,
  Certificate,
  CertificateRevocation,
  MailMessage,
  MailAttachment,
  MailAttempt,
  CapturedMail,
  GrindRequest,
  GrindRequestStep,
  GaugeStudy,
  GaugeStudySlot,
  GaugeStudyMeasurement,
];
