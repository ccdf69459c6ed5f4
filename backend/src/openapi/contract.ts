import type * as C from '@tiermode/shared-types';

/**
 * The shared-types contract as the OpenAPI document names it: each key is a type exported by
 * `@tiermode/shared-types`, whose JSON Schema (made from the same TypeScript by
 * ts-json-schema-generator when shared-types is built) is published under that name in the
 * document's components. `ApiContract` takes these names and the compiler checks that a route
 * said to return one really returns that type.
 */
export interface ContractTypes {
  AnalysisAnswer: C.AnalysisAnswer;
  AnalysisDetailQuery: C.AnalysisDetailQuery;
  AnalysisRequest: C.AnalysisRequest;
  AnalysisResponse: C.AnalysisResponse;
  AuditEventDto: C.AuditEventDto;
  AuditVerifyResponse: C.AuditVerifyResponse;
  CalculationAnswer: C.CalculationAnswer;
  CalculationChanges: C.CalculationChanges;
  CalculationDto: C.CalculationDto;
  CalculationExport: C.CalculationExport;
  CalculationListQuery: C.CalculationListQuery;
  CalculationSummaryDto: C.CalculationSummaryDto;
  ChangePasswordRequest: C.ChangePasswordRequest;
  ChecksRequest: C.ChecksRequest;
  ChecksResponse: C.ChecksResponse;
  ColumnStiffnessRequest: C.ColumnStiffnessRequest;
  ColumnStiffnessResponse: C.ColumnStiffnessResponse;
  CreateCalculationRequest: C.CreateCalculationRequest;
  CreateCommentRequest: C.CreateCommentRequest;
  CreateProjectRequest: C.CreateProjectRequest;
  CreateUserRequest: C.CreateUserRequest;
  DemoRecordResponse: C.DemoRecordResponse;
  FreeVibrationRequest: C.FreeVibrationRequest;
  FreeVibrationResponse: C.FreeVibrationResponse;
  RecordImportResponse: C.RecordImportResponse;
  RecordSpectrumRequest: C.RecordSpectrumRequest;
  RecordSpectrumResponse: C.RecordSpectrumResponse;
  ResponseHistoryRequest: C.ResponseHistoryRequest;
  ResponseHistoryResponse: C.ResponseHistoryResponse;
  ResponseHistoryResult: C.ResponseHistoryResult;
  HealthResponse: C.HealthResponse;
  LibraryEntryDto: C.LibraryEntryDto;
  ModalDetail: C.ModalDetail;
  LockCalculationRequest: C.LockCalculationRequest;
  LoginRequest: C.LoginRequest;
  LoginResponse: C.LoginResponse;
  MailMessageDto: C.MailMessageDto;
  MeResponse: C.MeResponse;
  ProjectDto: C.ProjectDto;
  ProjectMemberDto: C.ProjectMemberDto;
  ReturnCalculationRequest: C.ReturnCalculationRequest;
  ReviewCommentDto: C.ReviewCommentDto;
  SealCheckResponse: C.SealCheckResponse;
  SealPublicKeyResponse: C.SealPublicKeyResponse;
  SetPasswordRequest: C.SetPasswordRequest;
  SpectrumGenerateRequest: C.SpectrumGenerateRequest;
  SpectrumGenerateResponse: C.SpectrumGenerateResponse;
  SpectrumImportResponse: C.SpectrumImportResponse;
  StoreyImportResponse: C.StoreyImportResponse;
  UpdateCalculationRequest: C.UpdateCalculationRequest;
  UpdateCommentRequest: C.UpdateCommentRequest;
  UpdateProjectRequest: C.UpdateProjectRequest;
  UpdateUserRequest: C.UpdateUserRequest;
  UserDto: C.UserDto;
  VerificationCaseResult: C.VerificationCaseResult;
  WholeCalculationDto: C.WholeCalculationDto;
}

export type ContractName = keyof ContractTypes;

/** The components path of a contract type in the OpenAPI document. */
export const contractRef = (name: string) => ({ $ref: `#/components/schemas/${name}` });
